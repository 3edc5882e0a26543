/**
 * The substitution z ↦ a·z (ζ ↦ ζ^a); a = 0 restricts to z = 0. Exact to the same
 * q-order. Index and type bookkeeping belong to the type layer, not here.
 */
import { type QZSeries, makeSeries } from './qz-series.js';
import { sliceSubstitute } from './slice.js';

export function substituteZeta(s: QZSeries, a: number): QZSeries {
  if (!Number.isSafeInteger(a)) throw new RangeError('substitution factor too large');
  return makeSeries(s.start, s.qDen, s.den, s.slices.map((sl) => sliceSubstitute(sl, a)), s.exactTo, s.nvars);
}
