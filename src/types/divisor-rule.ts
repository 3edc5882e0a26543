/**
 * The exact divisor rule for theta quotients in one variable (MATH.md §3; after
 * Gritsenko–Skoruppa–Zagier, *Theta blocks*, 2019). In the torus C/(Zτ+Z) the zeros
 * of ϑ(τ, a z) are exactly the a-torsion points, all simple (ϑ(τ, ·) has one simple
 * zero per period parallelogram, at the lattice points). Hence Π ϑ(τ, a_i z)^{e_i}
 * has order Σ_{i : d | a_i} e_i at every point of exact order d, and the quotient is
 * holomorphic in z iff that sum is ≥ 0 for every d ≥ 1. Only divisors of some a_i
 * can give a non-zero sum, so finitely many d are checked. η-powers have no zeros
 * and do not enter. The lowest q-slice plays no part (MATH.md §3).
 */
import { divisors } from '../forms/divisor-sums.js';

export interface ThetaFactor {
  /** a in ϑ(τ, a z), a ≥ 1 (signs are pulled out as constants, a = 0 is the zero function). */
  readonly a: number;
  readonly exponent: number;
}

export interface DivisorRuleResult {
  readonly holomorphic: boolean;
  /** When not holomorphic: a torsion order d with negative order, and that order. */
  readonly pole?: { readonly d: number; readonly order: number };
}

/** The order of Π ϑ(a_i z)^{e_i} at a point of exact order d. */
export function orderAtTorsion(factors: readonly ThetaFactor[], d: number): number {
  let s = 0;
  for (const f of factors) if (f.a % d === 0) s += f.exponent;
  return s;
}

export function thetaQuotientHolomorphic(factors: readonly ThetaFactor[]): DivisorRuleResult {
  const candidates = new Set<number>();
  for (const f of factors) for (const d of divisors(f.a)) candidates.add(d);
  for (const d of [...candidates].sort((x, y) => x - y)) {
    const order = orderAtTorsion(factors, d);
    if (order < 0) return { holomorphic: false, pole: { d, order } };
  }
  return { holomorphic: true };
}
