/**
 * Eisenstein series of level one, E_k = 1 − (2k/B_k) Σ_{n≥1} σ_{k−1}(n) qⁿ for even
 * k ≥ 2 (MATH.md §2; e.g. Zagier, *Elliptic modular forms and their applications*,
 * 2008, §2.2). E_k ∈ M_k for k ≥ 4; E_2 is only quasi-modular (MATH.md §5).
 */
import {
  type QZSeries,
  type Rational,
  type Slice,
  EMPTY_SLICE,
  JSBI,
  rat,
  rdiv,
  rneg,
  makeSeries,
  sliceCountTo,
  zeroSeries,
  rcmp,
} from '../series/index.js';
import { bernoulli } from './bernoulli.js';
import { sigmaTable } from './divisor-sums.js';

/** The constant −2k/B_k (240 for k = 4, −504 for k = 6, −24 for k = 2). */
export function eisensteinConstant(k: number): Rational {
  return rneg(rdiv(rat(2 * k), bernoulli(k)));
}

/** E_k to q-order X; k even ≥ 2. */
export function eisensteinSeries(k: number, X: Rational): QZSeries {
  if (k < 2 || k % 2 !== 0) throw new RangeError(`E_${k}: the weight must be even and at least 2`);
  if (rcmp(X, rat(0)) < 0) return zeroSeries(X, rat(0));
  const n = sliceCountTo(rat(0), 1, X);
  const c = eisensteinConstant(k);
  const sig = sigmaTable(k - 1, n - 1);
  const slices: Slice[] = new Array<Slice>(n).fill(EMPTY_SLICE);
  slices[0] = { lo: 0, c: [c.den] };
  for (let i = 1; i < n; i++) slices[i] = { lo: 0, c: [JSBI.multiply(c.num, sig[i]!)] };
  return makeSeries(rat(0), 1, c.den, slices, X);
}

