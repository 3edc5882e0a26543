/**
 * Majorants (MATH.md §8) in cumulative form: for a series f known to q-order X,
 * `log2` bounds log₂ Σ_{x ≤ X} Σ_ℓ |c(x, ℓ)|, so it bounds every single slice too and
 * every coefficient's absolute value. Cumulative sums make the rules one line each and
 * exact inequalities, with no overflow since everything is a logarithm:
 * - product: every term of fg up to X is c_f(a)·c_g(b) with a ≤ X − v_g, b ≤ X − v_f,
 *   so C_fg(X) ≤ C_f(X − v_g)·C_g(X − v_f);
 * - power: C_{f^k}(X) ≤ C_f(X − (k−1)v_f)^k (k ≥ 1, the same argument k − 1 times);
 * - sum: C_{Σaᵢfᵢ} ≤ Σ|aᵢ|·C_{fᵢ}.
 * Logarithms are rounded up by a relative safety margin at every step.
 *
 * `den` is a D with D·c integral for every coefficient (so D·C bounds the numerators
 * the residues must recover); `avoid` is an integer every prime must not divide: the
 * product of every denominator met on the way (MATH.md §8).
 */
import { JSBI, type Int, ONE, lcm, abs, isZero } from '../integer.js';
import { type Rational } from '../rational.js';
import { bitLength } from '../modular/multi-modular-product.js';

export interface Majorant {
  readonly log2: number;
  readonly den: Int;
  readonly avoid: Int;
}

/** Relative margin for rounding in log scale; far above double rounding (2^-52 per step). */
const LOG_MARGIN = 1e-9;
const ABS_MARGIN = 1e-9;

export function up(x: number): number {
  return x + Math.abs(x) * LOG_MARGIN + ABS_MARGIN;
}

/** log₂ of an upper bound of a non-negative integer (−∞ for 0). */
export function log2UpperInt(x: Int): number {
  if (isZero(x)) return -Infinity;
  const n = Math.abs(JSBI.toNumber(x));
  if (Number.isFinite(n) && n < 2 ** 1000) return up(Math.log2(n));
  return bitLength(abs(x));
}

/** log₂ of a lower bound of a positive integer. */
export function log2LowerInt(x: Int): number {
  const n = Math.abs(JSBI.toNumber(x));
  if (Number.isFinite(n) && n < 2 ** 1000) return Math.log2(n) * (1 - LOG_MARGIN) - ABS_MARGIN;
  return bitLength(abs(x)) - 2;
}

/** log₂|r| rounded up (−∞ for 0). */
export function log2UpperRational(r: Rational): number {
  if (isZero(r.num)) return -Infinity;
  return up(log2UpperInt(r.num) - log2LowerInt(r.den));
}

/** log₂(2^a + 2^b) rounded up. */
export function log2AddUpper(a: number, b: number): number {
  if (a === -Infinity) return b;
  if (b === -Infinity) return a;
  const hi = Math.max(a, b);
  const lo = Math.min(a, b);
  return up(hi + Math.log2(1 + 2 ** (lo - hi)));
}

export function majorantProduct(parts: readonly Majorant[]): Majorant {
  let log2 = 0;
  let den: Int = ONE;
  let avoid: Int = ONE;
  for (const m of parts) {
    log2 = m.log2 === -Infinity || log2 === -Infinity ? -Infinity : up(log2 + m.log2);
    den = JSBI.multiply(den, m.den);
    avoid = lcm(avoid, m.avoid);
  }
  return { log2, den, avoid };
}

export function majorantPower(m: Majorant, k: number): Majorant {
  let den: Int = ONE;
  for (let i = 0; i < k; i++) den = JSBI.multiply(den, m.den);
  return { log2: m.log2 === -Infinity ? -Infinity : up(m.log2 * k), den, avoid: m.avoid };
}

export interface WeightedMajorant {
  readonly majorant: Majorant;
  readonly coefficient: Rational;
}

export function majorantSum(terms: readonly WeightedMajorant[]): Majorant {
  let log2 = -Infinity;
  let den: Int = ONE;
  let avoid: Int = ONE;
  for (const { majorant: m, coefficient: a } of terms) {
    if (isZero(a.num)) continue;
    log2 = log2AddUpper(log2, up(m.log2 + log2UpperRational(a)));
    den = lcm(den, JSBI.multiply(m.den, a.den));
    avoid = lcm(lcm(avoid, m.avoid), a.den);
  }
  return { log2, den, avoid };
}

/** The bits b of the height bound 2^b ≥ D·C that the residues must recover. */
export function heightBits(m: Majorant): number {
  if (m.log2 === -Infinity) return 0;
  return Math.max(0, Math.ceil(up(m.log2 + log2UpperInt(m.den))));
}
