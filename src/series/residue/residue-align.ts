/**
 * Several residue series on one grid: the lowest start, the lcm of the q-denominators
 * (and of the denominators of the start differences), the gcd of the ζ-steps and
 * offsets, the lowest q-order. Sums and comparisons read them entry by entry.
 */
import { type Rational, rmin, rcmp, rsub } from '../rational.js';
import { gcdNumber, lcmNumber, toNumber } from '../integer.js';
import { sliceCountTo } from '../qz-series.js';
import { type ResidueSeries, type ResidueGrid, regridResidues } from './residue-series.js';

export interface AlignedResidues extends ResidueGrid {
  /** data[s][i]: series s modulo prime i on the common grid, rows × width. */
  readonly data: readonly (readonly Int32Array[])[];
}

export function alignResidues(list: readonly ResidueSeries[]): AlignedResidues {
  const primes = list[0]!.primes;
  let exactTo = list[0]!.exactTo;
  let start = list[0]!.start;
  for (const s of list) {
    if (s.primes !== primes) throw new RangeError('internal: residue series over different primes');
    exactTo = rmin(exactTo, s.exactTo);
    start = rmin(start, s.start);
  }
  let qDen = 1;
  let zStep = 0;
  let zLo = Infinity;
  let zHi = -Infinity;
  for (const s of list) {
    qDen = lcmNumber(lcmNumber(qDen, s.qDen), toNumber(rsub(s.start, start).den));
    if (s.width > 1) zStep = gcdNumber(zStep, s.zStep);
    zLo = Math.min(zLo, s.zLo);
    zHi = Math.max(zHi, s.zLo + (s.width - 1) * s.zStep);
  }
  for (const s of list) zStep = gcdNumber(zStep, s.zLo - zLo);
  if (zStep === 0) zStep = 1;
  const width = (zHi - zLo) / zStep + 1;
  const rows = sliceCountTo(start, qDen, exactTo);
  const data = list.map((s) => {
    const g = regridResidues(s, qDen, zStep, zLo, width);
    const shift = rowShift(s.start, start, qDen);
    return g.data.map((a) => {
      const out = new Int32Array(rows * width);
      const n = Math.max(0, Math.min(g.rows, rows - shift)) * width;
      if (n > 0) out.set(a.subarray(0, n), shift * width);
      return out;
    });
  });
  return { primes, start, qDen, rows, exactTo, zLo, zStep, width, data };
}

function rowShift(from: Rational, to: Rational, qDen: number): number {
  if (rcmp(from, to) < 0) throw new RangeError('internal: a series starts before the grid');
  return sliceCountTo(to, qDen, from) - 1;
}
