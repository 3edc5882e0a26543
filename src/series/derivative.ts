/**
 * D_q = q d/dq and D_ζ = ζ d/dζ in the normalisation of MATH.md §1: D_q multiplies
 * the coefficient of q^x by x, D_ζ multiplies that of ζ^ℓ by ℓ. Exact to the same
 * q-order as the input.
 */
import { JSBI, type Int, int, lcmNumber, toNumber } from './integer.js';
import { rmul, rat } from './rational.js';
import { type QZSeries, makeSeries, sliceExponent } from './qz-series.js';
import { sliceWeighted, sliceScale } from './slice.js';

export function derivativeQ(s: QZSeries): QZSeries {
  let L = s.qDen;
  L = lcmNumber(L, toNumber(s.start.den));
  const slices = s.slices.map((sl, i) => {
    const x = rmul(sliceExponent(s, i), rat(L));
    return sliceScale(sl, x.num);
  });
  return makeSeries(s.start, s.qDen, JSBI.multiply(s.den, int(L)), slices, s.exactTo, s.nvars);
}

/** D_{ζ_i} (i = 0 for one variable); ζ-exponents are stored in halves, so ℓ = e/2. */
export function derivativeZeta(s: QZSeries, variable = 0): QZSeries {
  const weight = (e: readonly number[]): Int => int(e[variable]!);
  const slices = s.slices.map((sl) => sliceWeighted(sl, weight));
  return makeSeries(s.start, s.qDen, JSBI.multiply(s.den, int(2)), slices, s.exactTo, s.nvars);
}
