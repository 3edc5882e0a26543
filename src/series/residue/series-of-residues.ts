/**
 * Back from residues to exact coefficients (MATH.md §8): given D with D·c integral and
 * primes whose product M exceeds 2·D·C (C the majorant), the residues of D·c determine
 * D·c by CRT in (−M/2, M/2]; dividing by D gives c. The caller guarantees M > 2H;
 * nothing here can check it.
 */
import { JSBI, type Int, ZERO, ONE, isZero } from '../integer.js';
import { type QZSeries, makeSeries } from '../qz-series.js';
import { type Slice, EMPTY_SLICE } from '../slice.js';
import { garner } from '../modular/garner.js';
import { mulmod } from '../modular/mulmod.js';
import { type ResidueSeries, residueOf } from './residue-series.js';

/** The residues of D·c, one array per prime. */
function scaledResidues(r: ResidueSeries, den: Int): readonly Int32Array[] {
  if (JSBI.equal(den, ONE)) return r.data;
  return r.data.map((a, i) => {
    const { p } = r.primes[i]!;
    const d = residueOf(den, p);
    const pinv = 1 / p;
    const out = new Int32Array(a.length);
    for (let j = 0; j < a.length; j++) out[j] = mulmod(a[j]!, d, p, pinv);
    return out;
  });
}

/** The integers D·c of the whole grid, row-major. */
export function numeratorsOfResidues(r: ResidueSeries, den: Int): Int[] {
  return garner(scaledResidues(r, den), r.primes, r.rows * r.width);
}

export function seriesOfResidues(r: ResidueSeries, den: Int): QZSeries {
  const nums = numeratorsOfResidues(r, den);
  const zero = (x: Int): boolean => x === ZERO || isZero(x);
  const slices: Slice[] = new Array<Slice>(r.rows);
  for (let i = 0; i < r.rows; i++) {
    const base = i * r.width;
    let a = 0;
    let b = r.width;
    while (a < b && zero(nums[base + a]!)) a++;
    while (b > a && zero(nums[base + b - 1]!)) b--;
    if (a === b) {
      slices[i] = EMPTY_SLICE;
      continue;
    }
    if (r.zStep === 1) {
      slices[i] = { lo: r.zLo + a, c: nums.slice(base + a, base + b) };
      continue;
    }
    const c = new Array<Int>((b - a - 1) * r.zStep + 1).fill(ZERO);
    for (let j = a; j < b; j++) c[(j - a) * r.zStep] = nums[base + j]!;
    slices[i] = { lo: r.zLo + a * r.zStep, c };
  }
  return makeSeries(r.start, r.qDen, den, slices, r.exactTo);
}
