/** Multiplication by a monomial q^x ζ^(e/2): moves the grid, touches no numerator. */
import { type Rational, radd } from './rational.js';
import type { QZSeries } from './qz-series.js';
import { sliceShift } from './slice.js';

export function shiftSeries(s: QZSeries, x: Rational, e: readonly number[] | null = null): QZSeries {
  return {
    ...s,
    start: radd(s.start, x),
    exactTo: radd(s.exactTo, x),
    slices: e === null ? s.slices : s.slices.map((sl) => sliceShift(sl, e)),
  };
}
