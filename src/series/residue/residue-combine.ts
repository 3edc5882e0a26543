/**
 * Linear combinations Σ aᵢ·fᵢ of residue series with rational aᵢ (whose denominators
 * the primes avoid), on the common grid, to the lowest q-order among the terms.
 */
import { type Rational, rmin, rIsZero, rcmp } from '../rational.js';
import { mulmod } from '../modular/mulmod.js';
import type { NttPrime } from '../modular/ntt-primes.js';
import { type ResidueSeries, rationalResidue, zeroResidues, truncateResidues } from './residue-series.js';
import { alignResidues } from './residue-align.js';

export interface WeightedResidues {
  readonly series: ResidueSeries;
  readonly coefficient: Rational;
}

export function combineResidues(terms: readonly WeightedResidues[], primes: readonly NttPrime[]): ResidueSeries {
  let exactTo = terms[0]!.series.exactTo;
  for (const t of terms) exactTo = rmin(exactTo, t.series.exactTo);
  const live = terms.filter((t) => !rIsZero(t.coefficient));
  if (live.length === 0) return zeroResidues(primes, exactTo, 1, exactTo);
  const g = alignResidues(live.map((t) => t.series));
  const data = primes.map(({ p }, pi) => {
    const out = new Int32Array(g.rows * g.width);
    const pinv = 1 / p;
    live.forEach(({ coefficient }, si) => {
      const c = rationalResidue(coefficient, p);
      const a = g.data[si]![pi]!;
      for (let t = 0; t < out.length; t++) {
        const x = a[t]!;
        if (x === 0) continue;
        let v = out[t]! + (c === 1 ? x : mulmod(c, x, p, pinv));
        if (v >= p) v -= p;
        out[t] = v;
      }
    });
    return out;
  });
  const { start, qDen, rows, zLo, zStep, width } = g;
  const sum: ResidueSeries = { primes, start, qDen, rows, exactTo: g.exactTo, zLo, zStep, width, data };
  // a term with coefficient 0 still limits the q-order, as in the exact engine
  return rcmp(exactTo, g.exactTo) < 0 ? truncateResidues(sum, exactTo) : sum;
}
