/**
 * The combination (D_ζϑ)² − ϑ·D_ζ²ϑ, which vanishes to order two at z = 0 less than
 * ϑ² does: it is ϑ²·(℘̃ − E_2/12) (MATH.md §2, ℘̃). Shared by φ_{0,1} and ℘̃.
 */
import {
  type SeriesSource,
  type Rational,
  rat,
  radd,
  derivativeZeta,
  multiplySeries,
  subtractSeries,
  truncateSeries,
  cached,
  source,
} from '../series/index.js';
import { thetaSource } from './leaves.js';

export function thetaDerivativePairSource(): SeriesSource {
  const th = thetaSource(1);
  return cached(
    source(rat(1, 4), (X: Rational) => {
      const t = th.expand(radd(X, rat(-1, 8)));
      const d1 = derivativeZeta(t);
      const d2 = derivativeZeta(d1);
      return truncateSeries(subtractSeries(multiplySeries(d1, d1), multiplySeries(t, d2)), X);
    }),
  );
}
