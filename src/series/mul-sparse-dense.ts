/**
 * Product with a sparse factor (a theta or eta leaf has O(√N) terms up to q^N):
 * each term c·q^i·ζ^e of the sparse factor adds c times the dense factor, shifted,
 * into the result — shifted row additions, no work on the sparse factor's zeros.
 */
import { JSBI, type Int, ZERO, int, isZero } from './integer.js';
import { type QZSeries, makeSeries } from './qz-series.js';
import { type Slice, EMPTY_SLICE, dense, sliceIsZero, sliceHi, sliceWeight, trimSlice } from './slice.js';
import { planProduct } from './product-plan.js';

interface SparseTerm {
  readonly i: number;
  readonly e: number;
  readonly c: Int;
}

function sparseTerms(s: QZSeries, count: number): SparseTerm[] {
  const out: SparseTerm[] = [];
  for (let i = 0; i < Math.min(count, s.slices.length); i++) {
    const sl = dense(s.slices[i]!);
    for (let k = 0; k < sl.c.length; k++) if (!isZero(sl.c[k]!)) out.push({ i, e: sl.lo + k, c: sl.c[k]! });
  }
  return out;
}

/** `sparse · dense`; the product is commutative, the roles only steer the loops. */
export function mulSparseDense(sparse: QZSeries, full: QZSeries): QZSeries {
  const { a, b, start, qDen, exactTo, count } = planProduct(sparse, full);
  const terms = sparseTerms(a, count);
  const lo = new Array<number>(count).fill(Infinity);
  const hi = new Array<number>(count).fill(-Infinity);
  for (const t of terms) {
    for (let j = 0; j < b.slices.length && t.i + j < count; j++) {
      const bj = dense(b.slices[j]!);
      if (sliceIsZero(bj)) continue;
      lo[t.i + j] = Math.min(lo[t.i + j]!, bj.lo + t.e);
      hi[t.i + j] = Math.max(hi[t.i + j]!, sliceHi(bj) + t.e);
    }
  }
  if (fitsInDoubles(terms, b, count)) return finish(accumulateInDoubles(terms, b, count, lo, hi));
  const acc: Int[][] = lo.map((l, k) => (l === Infinity ? [] : new Array<Int>(hi[k]! - l + 1).fill(ZERO)));
  for (const t of terms) {
    for (let j = 0; j < b.slices.length && t.i + j < count; j++) {
      const bj = dense(b.slices[j]!);
      if (sliceIsZero(bj)) continue;
      const row = acc[t.i + j]!;
      const off = bj.lo + t.e - lo[t.i + j]!;
      for (let k = 0; k < bj.c.length; k++) {
        const v = bj.c[k]!;
        if (!isZero(v)) row[off + k] = JSBI.add(row[off + k]!, JSBI.multiply(t.c, v));
      }
    }
  }
  return finish(acc);

  function finish(rows: Int[][]): QZSeries {
    const slices: Slice[] = rows.map((c, k) => (c.length === 0 ? EMPTY_SLICE : trimSlice(lo[k]!, c)));
    return makeSeries(start, qDen, JSBI.multiply(a.den, b.den), slices, exactTo, a.nvars);
  }
}

/**
 * Whether every output coefficient, and every partial sum on the way to it, stays below
 * 2^53 in absolute value: each is a sum of products t.c·v with distinct sparse terms t,
 * so Σ_t |t.c| · max |v| bounds them all. Then doubles compute the product exactly.
 */
function fitsInDoubles(terms: readonly SparseTerm[], b: QZSeries, count: number): boolean {
  let sumA = 0;
  for (const t of terms) {
    const x = Math.abs(JSBI.toNumber(t.c));
    if (!Number.isSafeInteger(x)) return false;
    sumA += x;
  }
  let maxB = 0;
  for (let j = 0; j < Math.min(b.slices.length, count); j++) {
    for (const v of dense(b.slices[j]!).c) {
      const x = Math.abs(JSBI.toNumber(v));
      if (!Number.isSafeInteger(x)) return false;
      if (x > maxB) maxB = x;
    }
  }
  return sumA * maxB < 2 ** 53;
}

/** The same shifted row additions in Float64Array rows (exact under fitsInDoubles). */
function accumulateInDoubles(terms: readonly SparseTerm[], b: QZSeries, count: number, lo: readonly number[], hi: readonly number[]): Int[][] {
  const rows = lo.map((l, k) => (l === Infinity ? new Float64Array(0) : new Float64Array(hi[k]! - l + 1)));
  const bRows = b.slices.map((sl) => {
    const d = dense(sl);
    return { lo: d.lo, c: Float64Array.from(d.c, (v) => JSBI.toNumber(v)) };
  });
  for (const t of terms) {
    const c = JSBI.toNumber(t.c);
    for (let j = 0; j < bRows.length && t.i + j < count; j++) {
      const bj = bRows[j]!;
      if (bj.c.length === 0) continue;
      const row = rows[t.i + j]!;
      const off = bj.lo + t.e - lo[t.i + j]!;
      for (let k = 0; k < bj.c.length; k++) row[off + k] += c * bj.c[k]!;
    }
  }
  return rows.map((r) => Array.from(r, (x) => int(x)));
}

/** Number of non-zero numerators among the first `count` slices. */
export function nonZeroTerms(s: QZSeries, count = s.slices.length): number {
  let n = 0;
  for (let i = 0; i < Math.min(count, s.slices.length); i++) n += sliceWeight(s.slices[i]!);
  return n;
}
