/**
 * Kronecker substitution: a q,ζ-series truncated to n slices is packed into one
 * polynomial in t with q^i ζ^(e/2) ↦ t^(i·W + e − lo), W wider than any product
 * slice, so the product of the packings unpacks without overlap. The packed
 * product goes to the polynomial dispatcher (Karatsuba or the multi-modular route).
 */
import { JSBI, type Int, ZERO } from './integer.js';
import { type QZSeries, makeSeries } from './qz-series.js';
import { type Slice, dense, sliceIsZero, sliceHi, trimSlice } from './slice.js';
import { planProduct } from './product-plan.js';
import { polyMultiply } from './poly-multiply.js';

interface ZetaRange {
  readonly lo: number;
  readonly hi: number;
}

function zetaRange(s: QZSeries, count: number): ZetaRange {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < Math.min(count, s.slices.length); i++) {
    const sl = dense(s.slices[i]!);
    if (sliceIsZero(sl)) continue;
    lo = Math.min(lo, sl.lo);
    hi = Math.max(hi, sliceHi(sl));
  }
  return lo === Infinity ? { lo: 0, hi: -1 } : { lo, hi };
}

function pack(s: QZSeries, count: number, r: ZetaRange, W: number): Int[] {
  const n = Math.min(count, s.slices.length);
  const out: Int[] = new Array<Int>(Math.max(0, (n - 1) * W + (r.hi - r.lo + 1))).fill(ZERO);
  for (let i = 0; i < n; i++) {
    const sl = dense(s.slices[i]!);
    for (let k = 0; k < sl.c.length; k++) out[i * W + sl.lo + k - r.lo] = sl.c[k]!;
  }
  return out;
}

export function mulKronecker(x: QZSeries, y: QZSeries): QZSeries {
  const { a, b, start, qDen, exactTo, count } = planProduct(x, y);
  const ra = zetaRange(a, count);
  const rb = zetaRange(b, count);
  const W = ra.hi - ra.lo + (rb.hi - rb.lo) + 1;
  const slices: Slice[] = [];
  if (W <= 0) {
    for (let k = 0; k < count; k++) slices.push(trimSlice(0, []));
  } else {
    const pa = pack(a, count, ra, W);
    // a square keeps one packing, so the modular route transforms it once
    const prod = polyMultiply(pa, x === y ? pa : pack(b, count, rb, W));
    for (let k = 0; k < count; k++) {
      const row = prod.slice(k * W, (k + 1) * W);
      slices.push(trimSlice(ra.lo + rb.lo, row));
    }
  }
  return makeSeries(start, qDen, JSBI.multiply(a.den, b.den), slices, exactTo, a.nvars);
}
