/**
 * Linear combinations Σ aᵢ·fᵢ of residue series with rational aᵢ (whose denominators
 * the primes avoid), on the common grid, to the lowest q-order among the terms.
 */
import { type Rational, rmin, rcmp, rsub, rIsZero } from '../rational.js';
import { gcdNumber, lcmNumber, toNumber } from '../integer.js';
import { sliceCountTo } from '../qz-series.js';
import { mulmod } from '../modular/mulmod.js';
import { type ResidueSeries, regridResidues, rationalResidue, zeroResidues } from './residue-series.js';
import type { NttPrime } from '../modular/ntt-primes.js';

export interface WeightedResidues {
  readonly series: ResidueSeries;
  readonly coefficient: Rational;
}

function startMin(terms: readonly WeightedResidues[]): Rational {
  let s = terms[0]!.series.start;
  for (const t of terms) s = rmin(s, t.series.start);
  return s;
}

export function combineResidues(terms: readonly WeightedResidues[], primes: readonly NttPrime[]): ResidueSeries {
  let exactTo = terms[0]!.series.exactTo;
  for (const t of terms) exactTo = rmin(exactTo, t.series.exactTo);
  const live = terms.filter((t) => !rIsZero(t.coefficient));
  if (live.length === 0) return zeroResidues(primes, exactTo, 1, exactTo);
  const start = startMin(live);
  let qDen = 1;
  let zStep = 0;
  let zLo = Infinity;
  let zHi = -Infinity;
  for (const { series: s } of live) {
    qDen = lcmNumber(lcmNumber(qDen, s.qDen), toNumber(rsub(s.start, start).den));
    if (s.width > 1) zStep = gcdNumber(zStep, s.zStep);
    zLo = Math.min(zLo, s.zLo);
    zHi = Math.max(zHi, s.zLo + (s.width - 1) * s.zStep);
  }
  for (const { series: s } of live) zStep = gcdNumber(zStep, s.zLo - zLo);
  if (zStep === 0) zStep = 1;
  const width = (zHi - zLo) / zStep + 1;
  const rows = sliceCountTo(start, qDen, exactTo);
  const data = primes.map(({ p }, pi) => {
    const out = new Int32Array(rows * width);
    const pinv = 1 / p;
    for (const { series, coefficient } of live) {
      const c = rationalResidue(coefficient, p);
      // shift the term's rows to the common start: its start − start is a multiple of 1/qDen
      const g = regridResidues(series, qDen, zStep, zLo, width);
      const shift = rowShift(series.start, start, qDen);
      const a = g.data[pi]!;
      const n = Math.min(g.rows, rows - shift) * width;
      for (let t = 0; t < n; t++) {
        const x = a[t]!;
        if (x === 0) continue;
        const o = t + shift * width;
        let v = out[o]! + (c === 1 ? x : mulmod(c, x, p, pinv));
        if (v >= p) v -= p;
        out[o] = v;
      }
    }
    return out;
  });
  return { primes, start, qDen, rows, exactTo, zLo, zStep, width, data };
}

function rowShift(from: Rational, to: Rational, qDen: number): number {
  if (rcmp(from, to) < 0) throw new RangeError('internal: a term starts before the sum');
  const d = sliceCountTo(to, qDen, from) - 1;
  return d;
}
