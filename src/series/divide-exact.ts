/**
 * Exact division G = F/T slice by slice (MATH.md §3, theta quotients): with T's
 * lowest slice T_0 at q^(v_T), G_n = (F_{n} − Σ_{j≥1} T_j·G_{n−j}) / T_0 on the
 * shifted grid, each a Laurent-polynomial division that must be exact. A remainder
 * proves F/T is not a q,ζ-series with Laurent-polynomial slices (a pole in z), and
 * the result is null. G is exact to min(X_F − v_T, X_T − v_T + v_G), v_G = v_F − v_T.
 */
import { JSBI, ONE, lcmNumber } from './integer.js';
import { rsub, rmin, radd } from './rational.js';
import { type QZSeries, makeSeries, sliceCountTo, leadingExponent, valuationBound } from './qz-series.js';
import { regrid } from './grid.js';
import { type Slice, EMPTY_SLICE, sliceIsZero, sliceMultiply, sliceCombine, sliceDivideExact } from './slice.js';

export function divideExact(F: QZSeries, T: QZSeries): QZSeries | null {
  const vT = leadingExponent(T);
  if (vT === null) throw new RangeError('internal: division by a series not known to be non-zero');
  if (!JSBI.equal(T.den, ONE)) throw new RangeError('internal: exact division needs an integral divisor');
  const qDen = lcmNumber(F.qDen, T.qDen);
  const f = regrid(F, { start: F.start, qDen });
  const t = regrid(T, { start: vT, qDen });
  const vG = rsub(valuationBound(f), vT);
  const exactTo = rmin(rsub(f.exactTo, vT), radd(rsub(t.exactTo, vT), vG));
  const start = rsub(f.start, vT);
  const n = sliceCountTo(start, qDen, exactTo);
  const tSupport: number[] = [];
  for (let j = 1; j < t.slices.length; j++) if (!sliceIsZero(t.slices[j]!)) tSupport.push(j);
  const t0 = t.slices[0]!;
  const g: Slice[] = new Array<Slice>(n).fill(EMPTY_SLICE);
  for (let m = 0; m < n; m++) {
    let r: Slice = f.slices[m] ?? EMPTY_SLICE;
    for (const j of tSupport) {
      if (j > m) break;
      const gj = g[m - j]!;
      if (!sliceIsZero(gj)) r = sliceCombine(r, null, sliceMultiply(t.slices[j]!, gj), JSBI.BigInt(-1));
    }
    const quotient = sliceDivideExact(r, t0);
    if (quotient === null) return null;
    g[m] = quotient;
  }
  return makeSeries(start, qDen, f.den, g, exactTo, F.nvars);
}
