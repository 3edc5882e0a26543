/**
 * Powers of the Dedekind eta function, η^e = q^{e/24} Π(1−qⁿ)^e for every integer e
 * (MATH.md §2). Π(1−qⁿ) comes from Euler's pentagonal theorem,
 *   Π(1−qⁿ) = Σ_{k∈Z} (−1)^k q^{k(3k−1)/2},
 * which has O(√N) terms up to q^N, and the power from Miller's recurrence on that
 * sparse sum (cost O(N·√N)). η has no zeros on H, so every η^e is a unit (MATH.md §4).
 */
import {
  type QZSeries,
  type Rational,
  type Slice,
  EMPTY_SLICE,
  ONE,
  int,
  rat,
  rsub,
  rcmp,
  zeroSeries,
  makeSeries,
  sliceCountTo,
  powerSeries,
  shiftSeries,
} from '../series/index.js';

/** Π(1−qⁿ) to q-order X (X ≥ 0 in integral steps). */
export function eulerProductSeries(X: Rational): QZSeries {
  const n = sliceCountTo(rat(0), 1, X);
  const slices: Slice[] = new Array<Slice>(n).fill(EMPTY_SLICE);
  for (let k = 0; ; k++) {
    const p1 = (k * (3 * k - 1)) / 2;
    const p2 = (k * (3 * k + 1)) / 2;
    if (p1 >= n && p2 >= n) break;
    const c = k % 2 === 0 ? ONE : int(-1);
    if (p1 < n) slices[p1] = { lo: 0, c: [c] };
    if (k > 0 && p2 < n) slices[p2] = { lo: 0, c: [c] };
  }
  return makeSeries(rat(0), 1, ONE, slices, X);
}

/** η^e to q-order X. */
export function etaPowerSeries(e: number, X: Rational): QZSeries {
  const v = rat(e, 24);
  // q^{e/24}·P^e is exact to X exactly when P^e is exact to X − e/24.
  const inner = rsub(X, v);
  if (rcmp(inner, rat(0)) < 0) return zeroSeries(X, v);
  const base = eulerProductSeries(inner);
  const p = e === 1 ? base : powerSeries(base, e);
  return shiftSeries(p, v);
}
