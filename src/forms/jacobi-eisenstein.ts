/**
 * The Jacobi–Eisenstein series of index one (Eichler–Zagier, *The Theory of Jacobi
 * Forms*, 1985, Thm 2.1):
 *   E_{k,1} = Σ_{n ≥ 0, r ∈ Z, 4n ≥ r²} e_k(4n − r²) qⁿ ζ^r,   e_k(N) = H(k−1, N)/H(k−1, 0),
 * with Cohen's numbers H(r, N) (Cohen, Math. Ann. 217, 1975). k even ≥ 4.
 */
import {
  type QZSeries,
  type Rational,
  type Slice,
  type Int,
  EMPTY_SLICE,
  JSBI,
  ONE,
  ZERO,
  lcm,
  isqrt,
  rat,
  rdiv,
  makeSeries,
  sliceCountTo,
  trimSlice,
  zeroSeries,
  rcmp,
} from '../series/index.js';
import { cohenTable } from './cohen-numbers.js';

/** e_k(N) for 0 ≤ N ≤ nMax. */
export function jacobiEisensteinCoefficients(k: number, nMax: number): Rational[] {
  const h = cohenTable(k - 1, nMax);
  const h0 = h[0]!;
  return h.map((x) => rdiv(x, h0));
}

/** E_{k,1} to q-order X. */
export function jacobiEisensteinSeries(k: number, X: Rational): QZSeries {
  if (k < 4 || k % 2 !== 0) throw new RangeError(`E_{${k},1}: the weight must be even and at least 4`);
  if (rcmp(X, rat(0)) < 0) return zeroSeries(X, rat(0));
  const n = sliceCountTo(rat(0), 1, X);
  const e = jacobiEisensteinCoefficients(k, 4 * (n - 1));
  let den: Int = ONE;
  for (const x of e) den = lcm(den, x.den);
  const num = e.map((x) => JSBI.multiply(x.num, JSBI.divide(den, x.den)));
  const slices: Slice[] = new Array<Slice>(n).fill(EMPTY_SLICE);
  for (let m = 0; m < n; m++) {
    const rMax = isqrt(4 * m);
    const c: Int[] = new Array<Int>(4 * rMax + 1).fill(ZERO);
    for (let r = -rMax; r <= rMax; r++) if (4 * m >= r * r) c[2 * (r + rMax)] = num[4 * m - r * r]!;
    slices[m] = trimSlice(-2 * rMax, c);
  }
  return makeSeries(rat(0), 1, den, slices, X);
}
