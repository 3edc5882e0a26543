/**
 * What a series source offers the modular back-end: a majorant to any q-order and its
 * residues modulo given primes. A source without its own view is served by the exact
 * engine (expanded exactly, then reduced): its majorant is then the true sum of
 * absolute values, so every source can take part in a modular proof.
 */
import { JSBI, type Int, ZERO, ONE, abs } from '../integer.js';
import { type Rational, rcmp } from '../rational.js';
import type { QZSeries } from '../qz-series.js';
import { forEachTerm } from '../slice.js';
import type { NttPrime } from '../modular/ntt-primes.js';
import { type Majorant, log2UpperInt, log2LowerInt, up } from './majorant.js';
import { type ResidueSeries, residuesOfSeries, truncateResidues } from './residue-series.js';

export interface ModularView {
  majorant(X: Rational): Majorant;
  residues(X: Rational, primes: readonly NttPrime[]): ResidueSeries;
  /** f^k as a view, where the source knows more about its powers than the rules do. */
  power?(k: number): ModularView | undefined;
}

interface Expandable {
  expand(X: Rational): QZSeries;
}

export const ZERO_MAJORANT: Majorant = { log2: -Infinity, den: ONE, avoid: ONE };

/** The exact majorant of an exact series: Σ|numerators| / den, rounded up. */
export function majorantOfSeries(s: QZSeries): Majorant {
  let total: Int = ZERO;
  for (const sl of s.slices) forEachTerm(sl, (_e, c) => (total = JSBI.add(total, abs(c))));
  if (JSBI.equal(total, ZERO)) return { ...ZERO_MAJORANT, den: s.den, avoid: s.den };
  return { log2: up(log2UpperInt(total) - log2LowerInt(s.den)), den: s.den, avoid: s.den };
}

/** The view of a source through the exact engine. */
export function exactView(src: Expandable): ModularView {
  let last: QZSeries | null = null;
  const expand = (X: Rational): QZSeries => {
    if (last === null || rcmp(last.exactTo, X) !== 0) last = src.expand(X);
    return last;
  };
  return {
    majorant: (X) => majorantOfSeries(expand(X)),
    residues: (X, primes) => {
      const r = residuesOfSeries(expand(X), primes);
      return rcmp(r.exactTo, X) > 0 ? truncateResidues(r, X) : r;
    },
  };
}

/** Memoises the largest residues computed per prime set, and majorants per order. */
export function cachedView(v: ModularView): ModularView {
  let best: ResidueSeries | null = null;
  const majorants = new Map<string, Majorant>();
  return {
    majorant(X) {
      const key = `${X.num.toString()}/${X.den.toString()}`;
      let m = majorants.get(key);
      if (m === undefined) {
        m = v.majorant(X);
        majorants.set(key, m);
      }
      return m;
    },
    residues(X, primes) {
      if (best === null || best.primes !== primes || rcmp(best.exactTo, X) < 0) best = v.residues(X, primes);
      return rcmp(best.exactTo, X) === 0 ? best : truncateResidues(best, X);
    },
    ...(v.power ? { power: (k: number) => v.power!(k) } : {}),
  };
}
