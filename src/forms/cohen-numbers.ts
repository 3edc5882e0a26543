/**
 * Cohen's numbers H(r, N) (H. Cohen, *Sums involving the values at negative integers of
 * L-functions of quadratic characters*, Math. Ann. 217 (1975), 271–285):
 *   H(r, 0) = ζ(1 − 2r) = −B_{2r}/(2r);
 *   for N > 0, H(r, N) = 0 unless (−1)^r N ≡ 0, 1 (mod 4); then, with (−1)^r N = D f²
 *   and D a fundamental discriminant,
 *   H(r, N) = L(1 − r, χ_D) Σ_{d|f} μ(d) χ_D(d) d^{r−1} σ_{2r−1}(f/d),
 *   L(1 − r, χ_D) = −B_{r,χ_D}/r.
 * H(1, N) is the Hurwitz class number. The Jacobi–Eisenstein series E_{k,1} (k ≥ 4 even)
 * has coefficients e_k(N) = H(k − 1, N)/H(k − 1, 0) at N = 4n − r² (M. Eichler and
 * D. Zagier, *The Theory of Jacobi Forms*, 1985, Thm 2.1); MATH.md §2.
 */
import { JSBI, type Int, ZERO, int, mod } from '../series/integer.js';
import { type Rational, RZERO, rational, rmul, rneg, rdiv, rat } from '../series/rational.js';
import { bernoulli } from './bernoulli.js';
import { divisors, mobius, sigma, sigmaTable } from './divisor-sums.js';
import { generalizedBernoulli } from './generalized-bernoulli.js';
import { fundamentalDiscriminantSplit, kronecker } from './kronecker.js';

function requireArguments(r: number, N: number): void {
  if (!Number.isSafeInteger(r) || r < 1) throw new RangeError(`Cohen's H(r, N) needs an integer r ≥ 1, got ${r}`);
  if (!Number.isSafeInteger(N) || N < 0) throw new RangeError(`Cohen's H(r, N) needs an integer N ≥ 0, got ${N}`);
}

/** H(r, 0) = ζ(1 − 2r) = −B_{2r}/(2r). */
function constantTerm(r: number): Rational {
  return rdiv(rneg(bernoulli(2 * r)), rat(2 * r));
}

/** L(1 − r, χ_D) = −B_{r,χ_D}/r. */
function lValue(r: number, D: number): Rational {
  return rdiv(rneg(generalizedBernoulli(r, D)), rat(r));
}

/** Σ_{d|f} μ(d) χ_D(d) d^{r−1} σ_{2r−1}(f/d), with σ_{2r−1}(m) looked up by `sigmaOf`. */
function conductorSum(r: number, D: number, f: number, sigmaOf: (m: number) => Int): Int {
  let sum = ZERO;
  for (const d of divisors(f)) {
    const sign = mobius(d) * kronecker(D, d);
    if (sign === 0) continue;
    const term = JSBI.multiply(JSBI.exponentiate(int(d), int(r - 1)), sigmaOf(f / d));
    sum = sign > 0 ? JSBI.add(sum, term) : JSBI.subtract(sum, term);
  }
  return sum;
}

function valueAt(r: number, N: number, sigmaOf: (m: number) => Int): Rational {
  if (N === 0) return constantTerm(r);
  const discriminant = r % 2 === 0 ? N : -N;
  const residue = mod(discriminant, 4);
  if (residue !== 0 && residue !== 1) return RZERO;
  const { D, f } = fundamentalDiscriminantSplit(discriminant);
  return rmul(lValue(r, D), rational(conductorSum(r, D, f, sigmaOf)));
}

/** Cohen's H(r, N) for r ≥ 1, N ≥ 0, exactly. */
export function cohenH(r: number, N: number): Rational {
  requireArguments(r, N);
  return valueAt(r, N, (m) => sigma(2 * r - 1, m));
}

/**
 * H(r, N) for 0 ≤ N ≤ nMax. The L-values are cached per fundamental discriminant
 * (generalized-bernoulli.ts) and f ≤ √nMax, so σ_{2r−1} is tabulated only that far.
 */
export function cohenTable(r: number, nMax: number): Rational[] {
  requireArguments(r, nMax);
  const sigmas = sigmaTable(2 * r - 1, Math.floor(Math.sqrt(nMax)) + 1);
  const sigmaOf = (m: number): Int => sigmas[m]!;
  const table: Rational[] = [];
  for (let N = 0; N <= nMax; N++) table.push(valueAt(r, N, sigmaOf));
  return table;
}
