/**
 * The odd Jacobi theta function ϑ(τ, a·z) from its sparse sum (MATH.md §2):
 *   ϑ(τ, z) = Σ_{n∈Z} χ₋₄(n) q^{n²/8} ζ^{n/2}
 * (equal to the triple product q^{1/8}(ζ^{1/2} − ζ^{−1/2})Π(1−qⁿζ)(1−qⁿζ^{−1})(1−qⁿ);
 * Jacobi's triple product identity, checked in test/forms). Only odd n contribute and
 * n² ≡ 1 (mod 8), so ϑ = q^{1/8}·(a series in integral powers of q); n = ±(2m+1)
 * gives the slice q^{1/8 + m(m+1)/2}. ϑ(τ, 0·z) = 0 identically (χ₋₄ is odd).
 */
import {
  type QZSeries,
  type Rational,
  type Slice,
  EMPTY_SLICE,
  int,
  rat,
  makeSeries,
  sliceCountTo,
  trimSlice,
  zeroSeries,
  ONE,
} from '../series/index.js';

export const THETA_START: Rational = rat(1, 8);

/** ϑ(τ, a z) to q-order X (every coefficient with q-exponent ≤ X). */
export function thetaSeries(a: number, X: Rational): QZSeries {
  if (a === 0) return zeroSeries(X, THETA_START);
  const n = sliceCountTo(THETA_START, 1, X);
  const slices: Slice[] = new Array<Slice>(n).fill(EMPTY_SLICE);
  for (let m = 0; m * (m + 1) / 2 < n; m++) {
    const odd = 2 * m + 1;
    // χ₋₄(odd) at ζ^{odd/2} and χ₋₄(−odd) = −χ₋₄(odd) at ζ^{−odd/2}; in halves: ±odd·a.
    const chi = odd % 4 === 1 ? 1 : -1;
    const e = odd * Math.abs(a);
    const sgn = a > 0 ? chi : -chi;
    const c = new Array(2 * e + 1).fill(int(0));
    c[0] = int(-sgn);
    c[2 * e] = int(sgn);
    slices[(m * (m + 1)) / 2] = trimSlice(-e, c);
  }
  return makeSeries(THETA_START, 1, ONE, slices, X);
}
