/**
 * A cheap upper estimate of the number of coefficients an expansion stores, made
 * before anything is allocated (ARCHITECTURE.md, errors and limits). For index m a
 * weak Jacobi form has c(n, r) = 0 unless r² ≤ 4mn + m² (Eichler–Zagier 1985, §9:
 * weak forms are determined by 4mn − r² ≥ −m²), so a slice n steps above the
 * valuation has at most 2(2√(mn) + m) + 1 ζ-exponents in units of ½ … doubled to
 * cover half-integral exponents and intermediate products.
 */
import { type Rational, rsub, rToNumber } from '../series/index.js';

export function estimateTerms(index: number, valuation: Rational, X: Rational): number {
  const steps = Math.floor(rToNumber(rsub(X, valuation))) + 1;
  if (steps <= 0) return 0;
  const m = Math.max(0, index);
  // Σ_{n<N} (4(2√(mn) + m) + 1) ≤ N(4m + 1) + (16/3)√m·N^{3/2}
  return steps * (4 * m + 1) + (16 / 3) * Math.sqrt(m) * Math.pow(steps, 1.5);
}
