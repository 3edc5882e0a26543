/**
 * A cheap upper estimate of the number of coefficients an expansion stores, made
 * before anything is allocated (ARCHITECTURE.md, errors and limits).
 * - One variable, index m: a weak Jacobi form has c(n, r) = 0 unless r² ≤ 4mn + m²
 *   (Eichler–Zagier 1985, §9), so a slice n steps above the valuation has at most
 *   2(2√(mn) + m) + 1 ζ-exponents in units of ½ … doubled to cover half-integral
 *   exponents and intermediate products.
 * - Several variables, index M: the exponents of a slice n steps up lie in the
 *   ellipsoid ℓᵀM⁻¹ℓ ≤ 4(x + 1) at q-exponent x (the same bound, with the hyperbolic
 *   norm), of volume V_r·(2√(x+1))^r·√det M′ for the positive definite part M′ of rank r;
 *   the exponents lie on a coset of Z^r (density 1).
 */
import { type Rational, rsub, rToNumber, rat, radd } from '../series/index.js';
import { type ModularType, determinant, scalarIndexOf, integralKernelSplit } from '../types/index.js';

export function estimateTerms(index: number, valuation: Rational, X: Rational): number {
  const steps = Math.floor(rToNumber(rsub(X, valuation))) + 1;
  if (steps <= 0) return 0;
  const m = Math.max(0, index);
  // Σ_{n<N} (4(2√(mn) + m) + 1) ≤ N(4m + 1) + (16/3)√m·N^{3/2}
  return steps * (4 * m + 1) + (16 / 3) * Math.sqrt(m) * Math.pow(steps, 1.5);
}

function unitBallVolume(k: number): number {
  // V_k = π^{k/2} / Γ(k/2 + 1), by the recurrence V_k = 2π/k · V_{k−2}
  let v = k % 2 === 0 ? 1 : 2;
  for (let j = k % 2 === 0 ? 2 : 3; j <= k; j += 2) v *= (2 * Math.PI) / j;
  return v;
}

/** The positive definite part of an index and its rank (the kernel carries no new exponents). */
function reducedIndex(M: readonly (readonly Rational[])[]): { M: readonly (readonly Rational[])[]; rank: number } {
  try {
    const split = integralKernelSplit(M);
    return { M: split.reduced, rank: split.rank };
  } catch {
    // not positive semi-definite: enlarge by the identity, which only over-estimates
    return { M: M.map((row, i) => row.map((x, j) => (i === j ? radd(x, rat(1)) : x))), rank: M.length };
  }
}

export function estimateTermsForType(t: ModularType, valuation: Rational, X: Rational): number {
  const k = t.index.length;
  if (k <= 1) return estimateTerms(rToNumber(scalarIndexOf(t)), valuation, X);
  const steps = Math.floor(rToNumber(rsub(X, valuation))) + 1;
  if (steps <= 0) return 0;
  const { M, rank } = reducedIndex(t.index);
  if (rank === 0) return steps;
  const det = rToNumber(determinant(M));
  const v = rToNumber(valuation);
  let total = 0;
  for (let n = 0; n < steps; n++) {
    // ℓᵀM⁻¹ℓ ≤ 4(x + 1) on a coset of Z^rank (density 1)
    const radius = 2 * Math.sqrt(Math.max(1, v + n + 1));
    total += unitBallVolume(rank) * Math.pow(radius, rank) * Math.sqrt(det) + 1;
  }
  return total;
}
