/**
 * A whole expansion through the modular back-end (MATH.md §8): the majorant gives the
 * height bound H = D·C, primes avoiding every denominator met are chosen with product
 * above 2H, the residues are computed in word-size arithmetic, and CRT recovers the
 * exact series. The route records what the proof used.
 */
import { type Rational, rcmp } from './rational.js';
import type { QZSeries } from './qz-series.js';
import { type SeriesSource, modularOf } from './series-source.js';
import { heightBits, majorantBlockLength } from './residue/majorant.js';
import { choosePrimes } from './residue/prime-choice.js';
import { seriesOfResidues } from './residue/series-of-residues.js';
import type { ResidueSeries } from './residue/residue-series.js';
import type { Majorant } from './residue/majorant.js';

export interface ModularRoute {
  readonly primes: readonly number[];
  /** b with every numerator (over the common denominator D) at most 2^b in absolute value. */
  readonly heightBits: number;
}

export interface ModularResidues {
  readonly residues: ResidueSeries;
  readonly majorant: Majorant;
  readonly route: ModularRoute;
}

/**
 * The residues of s to X with enough primes for its own height; null if the table is
 * too short or more than `maxPrimes` would be needed.
 */
export function modularResidues(s: SeriesSource, X: Rational, maxPrimes = Infinity): ModularResidues | null {
  const view = modularOf(s);
  const majorant = view.majorant(X, majorantBlockLength(X, s.valuation));
  const bits = heightBits(majorant);
  const choice = choosePrimes(bits, majorant.avoid);
  if (choice === null || choice.primes.length > maxPrimes) return null;
  const residues = view.residues(X, choice.primes);
  if (rcmp(residues.exactTo, X) < 0) throw new RangeError('internal: residues short of the q-order asked');
  return { residues, majorant, route: { primes: choice.primes.map((p) => p.p), heightBits: bits } };
}

/** s to q-order X through residues and CRT; null when the prime table is too short. */
export function expandModular(s: SeriesSource, X: Rational, maxPrimes = Infinity): { series: QZSeries; route: ModularRoute } | null {
  const m = modularResidues(s, X, maxPrimes);
  if (m === null) return null;
  return { series: seriesOfResidues(m.residues, m.majorant.den), route: m.route };
}
