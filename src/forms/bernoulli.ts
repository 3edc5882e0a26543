/**
 * Bernoulli numbers and polynomials, exactly, with the convention B_1 = −1/2
 * (the generating function t/(e^t − 1) = Σ B_n t^n/n!; Ireland–Rosen, *A Classical
 * Introduction to Modern Number Theory*, 2nd ed., 1990, ch. 15). They give the constant
 * terms of the Eisenstein series E_k = 1 − (2k/B_k) Σ σ_{k−1}(n) q^n (MATH.md §2) and,
 * through Bernoulli polynomials, the generalized Bernoulli numbers of quadratic characters.
 */
import { JSBI, type Int, ONE, int } from '../series/integer.js';
import { type Rational, RZERO, RONE, radd, rmul, rational } from '../series/rational.js';

/** B_0, B_1, … as far as anyone asked; grown on demand, never shrunk. */
const table: Rational[] = [RONE];

/** The binomial coefficients C(n, 0..n) of one row, exactly. */
function binomialRow(n: number): Int[] {
  const row: Int[] = [ONE];
  for (let k = 1; k <= n; k++) {
    row.push(JSBI.divide(JSBI.multiply(row[k - 1]!, int(n - k + 1)), int(k)));
  }
  return row;
}

/**
 * Appends B_n to the table from Σ_{k=0}^{n} C(n+1, k) B_k = 0 (n ≥ 1), the identity
 * obtained by multiplying t/(e^t − 1) by (e^t − 1)/t; it is the recurrence that
 * yields B_1 = −1/2.
 */
function extendTable(n: number): void {
  const row = binomialRow(n + 1);
  let sum = RZERO;
  for (let k = 0; k < n; k++) {
    const bk = table[k]!;
    if (k > 1 && k % 2 === 1) continue; // odd Bernoulli numbers beyond B_1 vanish
    sum = radd(sum, rmul(rational(row[k]!), bk));
  }
  table.push(rmul(sum, rational(int(-1), int(n + 1))));
}

/** The Bernoulli number B_n (n ≥ 0), with B_1 = −1/2. */
export function bernoulli(n: number): Rational {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`bernoulli: index must be a natural number, got ${n}`);
  while (table.length <= n) extendTable(table.length);
  return table[n]!;
}

/**
 * The coefficients of the Bernoulli polynomial B_n(x) = Σ_{k=0}^{n} C(n, k) B_k x^{n−k}:
 * entry i is the coefficient of x^i.
 */
export function bernoulliPolynomialCoefficients(n: number): Rational[] {
  const row = binomialRow(n);
  const coefficients: Rational[] = [];
  for (let i = 0; i <= n; i++) coefficients.push(rmul(rational(row[n - i]!), bernoulli(n - i)));
  return coefficients;
}

/** The Bernoulli polynomial B_n(x) at a rational x (B_n(0) = B_n, B_1(x) = x − 1/2). */
export function bernoulliPolynomial(n: number, x: Rational): Rational {
  const coefficients = bernoulliPolynomialCoefficients(n);
  let value = RZERO;
  for (let i = n; i >= 0; i--) value = radd(rmul(value, x), coefficients[i]!);
  return value;
}
