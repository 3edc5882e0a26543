/**
 * What a series source offers the modular back-end: a majorant to any q-order and its
 * residues modulo given primes. A source without its own view is served by the exact
 * engine (expanded exactly, then reduced): its majorant is then the true sum of
 * absolute values, so every source can take part in a modular proof.
 */
import { JSBI, type Int, ZERO, abs, isZero } from '../integer.js';
import { type Rational, rcmp } from '../rational.js';
import { type QZSeries, sliceExponent } from '../qz-series.js';
import { forEachTerm } from '../slice.js';
import type { NttPrime } from '../modular/ntt-primes.js';
import { type Majorant, log2UpperInt, log2LowerInt, up, blockOf, majorantFromLog2, zeroMajorant, withOffset } from './majorant.js';
import { type ResidueSeries, residuesOfSeries, truncateResidues } from './residue-series.js';
import { type IntegerGrid, integersOfSeries, truncateIntegers } from './integer-grid.js';
import type { Spectrum } from './residue-spectrum.js';

export interface ModularView {
  /** Block bounds (block length h q-steps) of |coefficients| up to q-order X. */
  majorant(X: Rational, h: number): Majorant;
  residues(X: Rational, primes: readonly NttPrime[]): ResidueSeries;
  /** f^k as a view, where the source knows more about its powers than the rules do. */
  power?(k: number): ModularView | undefined;
  /**
   * Its exact coefficients to X as an integer grid (integer-grid.ts), or null when they
   * are not all integers below EXACT_LIMIT or would cost too much to find out.
   */
  integers?(X: Rational): IntegerGrid | null;
  /**
   * For a source q^v/(U_1···U_m) with q-only integer series U_i, U_i(0) = 1 (v its
   * valuation): the U_i to X − v q-steps, u[k] the coefficient of q^k; null if unknown.
   */
  reciprocal?(X: Rational): readonly Float64Array[] | null;
  /**
   * The source as a product of other views, each to a power (a power or product of
   * sources with integers): a product of theta blocks multiplies leaf by leaf, sparse
   * factor by sparse factor, instead of power by power.
   */
  readonly leaves?: readonly ViewLeaf[];
  /** Its residues still in the transform domain, where that is its own route (residue-spectrum.ts); else null. */
  spectrum?(X: Rational, primes: readonly NttPrime[]): Spectrum | null;
}

export interface ViewLeaf {
  readonly view: ModularView;
  readonly valuation: Rational;
  readonly count: number;
}

interface Expandable {
  expand(X: Rational): QZSeries;
}

/** The exact majorant of an exact series to q-order X: per block, Σ|numerators| / den, rounded up. */
export function majorantOfSeries(s: QZSeries, X: Rational, h: number): Majorant {
  const first = blockOf(s.start, h);
  const last = blockOf(X, h);
  if (last < first) return { ...zeroMajorant(h, first), den: s.den, avoid: s.den };
  const totals: Int[] = new Array<Int>(last - first + 1).fill(ZERO);
  s.slices.forEach((sl, i) => {
    const x = sliceExponent(s, i);
    if (rcmp(x, X) > 0) return;
    const j = blockOf(x, h) - first;
    forEachTerm(sl, (_e, c) => (totals[j] = JSBI.add(totals[j]!, abs(c))));
  });
  const lowDen = log2LowerInt(s.den);
  const m = majorantFromLog2(h, first, totals.map((t) => (isZero(t) ? -Infinity : up(log2UpperInt(t) - lowDen))), s.den, s.den);
  // one slice per q-step: every exponent is start + an integer
  return s.qDen === 1 ? withOffset(m, s.start) : m;
}

/** The view of a source through the exact engine. */
export function exactView(src: Expandable): ModularView {
  let last: QZSeries | null = null;
  const expand = (X: Rational): QZSeries => {
    if (last === null || rcmp(last.exactTo, X) !== 0) last = src.expand(X);
    return last;
  };
  return {
    majorant: (X, h) => majorantOfSeries(expand(X), X, h),
    residues: (X, primes) => {
      const r = residuesOfSeries(expand(X), primes);
      return rcmp(r.exactTo, X) > 0 ? truncateResidues(r, X) : r;
    },
    integers: (X) => {
      const g = integersOfSeries(expand(X));
      return g !== null && rcmp(g.exactTo, X) > 0 ? truncateIntegers(g, X) : g;
    },
  };
}

/** Memoises the largest residues computed per prime set, majorants per order, integers at the last order asked. */
export function cachedView(v: ModularView): ModularView {
  let best: ResidueSeries | null = null;
  const majorants = new Map<string, Majorant>();
  return {
    ...(v.integers ? { integers: lastOrder(v.integers.bind(v)) } : {}),
    ...(v.reciprocal ? { reciprocal: lastOrder(v.reciprocal.bind(v)) } : {}),
    majorant(X, h) {
      const key = `${X.num.toString()}/${X.den.toString()}@${h}`;
      let m = majorants.get(key);
      if (m === undefined) {
        m = v.majorant(X, h);
        majorants.set(key, m);
      }
      return m;
    },
    residues(X, primes) {
      if (best === null || best.primes !== primes || rcmp(best.exactTo, X) < 0) best = v.residues(X, primes);
      return rcmp(best.exactTo, X) === 0 ? best : truncateResidues(best, X);
    },
    ...(v.power ? { power: (k: number) => v.power!(k) } : {}),
    ...(v.spectrum ? { spectrum: v.spectrum.bind(v) } : {}),
  };
}

/** f memoised at the last q-order it was called with (majorant and residues ask for the same). */
export function lastOrder<T>(f: (X: Rational) => T): (X: Rational) => T {
  let at: Rational | null = null;
  let value: T;
  return (X) => {
    if (at === null || rcmp(at, X) !== 0) {
      value = f(X);
      at = X;
    }
    return value;
  };
}
