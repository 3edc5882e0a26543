/**
 * Schoolbook product of two series, slice by slice, skipping zero slices and zero
 * numerators: the reference every other multiplication algorithm is tested against.
 */
import { JSBI, type Int, ZERO } from './integer.js';
import { type QZSeries, makeSeries } from './qz-series.js';
import {
  type Slice,
  EMPTY_SLICE,
  dense,
  sliceIsZero,
  sliceHi,
  sliceMultiply,
  sliceCombine,
  sliceMultiplyInto,
  trimSlice,
} from './slice.js';
import { planProduct } from './product-plan.js';

export function mulSchoolbook(x: QZSeries, y: QZSeries): QZSeries {
  if (x.nvars > 1) return mulSchoolbookSparse(x, y);
  const { a, b, start, qDen, exactTo, count } = planProduct(x, y);
  const lo = new Array<number>(count).fill(Infinity);
  const hi = new Array<number>(count).fill(-Infinity);
  const na = Math.min(a.slices.length, count);
  const nb = Math.min(b.slices.length, count);
  for (let i = 0; i < na; i++) {
    const ai = dense(a.slices[i]!);
    if (sliceIsZero(ai)) continue;
    for (let j = 0; j < nb && i + j < count; j++) {
      const bj = dense(b.slices[j]!);
      if (sliceIsZero(bj)) continue;
      lo[i + j] = Math.min(lo[i + j]!, ai.lo + bj.lo);
      hi[i + j] = Math.max(hi[i + j]!, sliceHi(ai) + sliceHi(bj));
    }
  }
  const acc: Int[][] = lo.map((l, k) => (l === Infinity ? [] : new Array<Int>(hi[k]! - l + 1).fill(ZERO)));
  for (let i = 0; i < na; i++) {
    const ai = dense(a.slices[i]!);
    if (sliceIsZero(ai)) continue;
    for (let j = 0; j < nb && i + j < count; j++) {
      const bj = dense(b.slices[j]!);
      if (sliceIsZero(bj)) continue;
      const k = i + j;
      sliceMultiplyInto(acc[k]!, ai.lo + bj.lo - lo[k]!, ai, bj);
    }
  }
  const slices: Slice[] = acc.map((c, k) => (c.length === 0 ? EMPTY_SLICE : trimSlice(lo[k]!, c)));
  return makeSeries(start, qDen, JSBI.multiply(a.den, b.den), slices, exactTo, a.nvars);
}

/** Several variables: the same double loop over slices with sparse slice products. */
function mulSchoolbookSparse(x: QZSeries, y: QZSeries): QZSeries {
  const { a, b, start, qDen, exactTo, count } = planProduct(x, y);
  const acc: Slice[] = new Array<Slice>(count).fill(EMPTY_SLICE);
  for (let i = 0; i < Math.min(a.slices.length, count); i++) {
    const ai = a.slices[i]!;
    if (sliceIsZero(ai)) continue;
    for (let j = 0; j < b.slices.length && i + j < count; j++) {
      const bj = b.slices[j]!;
      if (!sliceIsZero(bj)) acc[i + j] = sliceCombine(acc[i + j]!, null, sliceMultiply(ai, bj), null);
    }
  }
  return makeSeries(start, qDen, JSBI.multiply(a.den, b.den), acc, exactTo, a.nvars);
}
