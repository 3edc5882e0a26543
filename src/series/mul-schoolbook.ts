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
  forEachTerm,
  sliceMultiplyInto,
  trimSlice,
} from './slice.js';
import { planProduct } from './product-plan.js';
import { SparseAccumulator } from './sparse-accumulator.js';

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

/** The largest |exponent| in any coordinate over the first `count` slices. */
function maxAbsExponent(s: QZSeries, count: number): number {
  let m = 0;
  for (let i = 0; i < Math.min(count, s.slices.length); i++) forEachTerm(s.slices[i]!, (e) => e.forEach((x) => (m = Math.max(m, Math.abs(x)))));
  return m;
}

/** Several variables: the same double loop over slices, accumulating sparse products. */
function mulSchoolbookSparse(x: QZSeries, y: QZSeries): QZSeries {
  const { a, b, start, qDen, exactTo, count } = planProduct(x, y);
  const maxAbs = maxAbsExponent(a, count) + maxAbsExponent(b, count);
  const acc: (SparseAccumulator | null)[] = new Array<SparseAccumulator | null>(count).fill(null);
  // one accumulator packs like any other (same n and maxAbs): each slice is packed once
  const packer = new SparseAccumulator(a.nvars, maxAbs);
  const packedA = packer.packs ? a.slices.slice(0, count).map((s) => packer.pack(s)) : [];
  const packedB = packer.packs ? b.slices.slice(0, count).map((s) => packer.pack(s)) : [];
  for (let i = 0; i < Math.min(a.slices.length, count); i++) {
    const ai = a.slices[i]!;
    if (sliceIsZero(ai)) continue;
    for (let j = 0; j < b.slices.length && i + j < count; j++) {
      const bj = b.slices[j]!;
      if (sliceIsZero(bj)) continue;
      const target = (acc[i + j] ??= new SparseAccumulator(a.nvars, maxAbs));
      if (target.packs) {
        target.addProducts(packedA[i]!, packedB[j]!);
        continue;
      }
      forEachTerm(ai, (ea, va) =>
        forEachTerm(bj, (eb, vb) =>
          target.add(
            ea.map((t, k) => t + eb[k]!),
            JSBI.multiply(va, vb),
          ),
        ),
      );
    }
  }
  const slices: Slice[] = acc.map((t) => (t === null ? EMPTY_SLICE : t.toSlice()));
  return makeSeries(start, qDen, JSBI.multiply(a.den, b.den), slices, exactTo, a.nvars);
}
