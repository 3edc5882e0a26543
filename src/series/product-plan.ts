/**
 * What a product of two series can know: its grid and the q-order to which it is
 * exact. With a known to X_a and b to X_b, and v_a, v_b lower bounds of their
 * valuations, c = a·b is exact to min(X_a + v_b, X_b + v_a) (every term of a
 * coefficient of c below that order involves only known coefficients).
 */
import { lcmNumber } from './integer.js';
import { type Rational, radd, rmin } from './rational.js';
import { type QZSeries, sliceCountTo, valuationBound } from './qz-series.js';
import { regrid } from './grid.js';

export interface ProductPlan {
  readonly a: QZSeries;
  readonly b: QZSeries;
  readonly start: Rational;
  readonly qDen: number;
  readonly exactTo: Rational;
  /** Number of product slices to compute. */
  readonly count: number;
}

export function planProduct(x: QZSeries, y: QZSeries): ProductPlan {
  const qDen = lcmNumber(x.qDen, y.qDen);
  const a = regrid(x, { start: x.start, qDen });
  const b = regrid(y, { start: y.start, qDen });
  const exactTo = rmin(radd(a.exactTo, valuationBound(b)), radd(b.exactTo, valuationBound(a)));
  const start = radd(a.start, b.start);
  return { a, b, start, qDen, exactTo, count: sliceCountTo(start, qDen, exactTo) };
}
