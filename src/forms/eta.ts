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
  multiplySeries,
  MILLER_MAX_SLICES,
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

/**
 * Π(1−qⁿ)³ = Σ_{n≥0} (−1)ⁿ (2n+1) q^{n(n+1)/2} to q-order X (Jacobi's identity; OEIS
 * A010816): as sparse as the pentagonal sum, and three powers at once.
 */
export function eulerCubeSeries(X: Rational): QZSeries {
  const n = sliceCountTo(rat(0), 1, X);
  const slices: Slice[] = new Array<Slice>(n).fill(EMPTY_SLICE);
  for (let k = 0; (k * (k + 1)) / 2 < n; k++) slices[(k * (k + 1)) / 2] = { lo: 0, c: [int(k % 2 === 0 ? 2 * k + 1 : -(2 * k + 1))] };
  return makeSeries(rat(0), 1, ONE, slices, X);
}

/**
 * Long positive powers start from the cube (Jacobi) and square: P^e = (P³)^⌊e/3⌋·P^(e mod 3);
 * the squarings go through the multi-modular product. Short or negative powers use
 * Miller's recurrence on the pentagonal sum (series/power.ts chooses).
 */
function eulerPower(e: number, X: Rational): QZSeries {
  if (e >= 3 && sliceCountTo(rat(0), 1, X) >= MILLER_MAX_SLICES) {
    const cubes = powerSeries(eulerCubeSeries(X), Math.floor(e / 3));
    const rest = e % 3;
    return rest === 0 ? cubes : multiplySeries(cubes, powerSeries(eulerProductSeries(X), rest));
  }
  const base = eulerProductSeries(X);
  return e === 1 ? base : powerSeries(base, e);
}

/** η^e to q-order X. */
export function etaPowerSeries(e: number, X: Rational): QZSeries {
  const v = rat(e, 24);
  // q^{e/24}·P^e is exact to X exactly when P^e is exact to X − e/24.
  const inner = rsub(X, v);
  if (rcmp(inner, rat(0)) < 0) return zeroSeries(X, v);
  return shiftSeries(eulerPower(e, inner), v);
}
