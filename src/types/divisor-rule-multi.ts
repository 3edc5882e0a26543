/**
 * The divisor rule for theta quotients in several variables (MATH.md §3): group the
 * factors ϑ(τ, ℓ_i·z), ℓ_i = a_i ℓ′, by primitive direction ±ℓ′, and apply the
 * one-variable rule (`thetaQuotientHolomorphic`) in every direction separately.
 *
 * Why this is exact. Fix τ and the torus T = Cⁿ/(Zⁿτ + Zⁿ). For ℓ′ ∈ Zⁿ primitive,
 * extend ℓ′ to a unimodular matrix W with first row ℓ′ (possible exactly because ℓ′ is
 * primitive); in the coordinates w = Wz, T is again Cⁿ/(Zⁿτ + Zⁿ) and ℓ′·z = w₁.
 * So ϑ(τ, aℓ′·z) = ϑ(τ, a w₁) vanishes exactly on the subtori {w₁ ≡ t}, t running over
 * the a-torsion points of C/(Zτ + Z), each simply (a simple zero of a function of w₁
 * alone pulls back to a reduced divisor); each subtorus {ℓ′·z ≡ t} is connected, hence
 * an irreducible divisor. Subtori of different directions ±ℓ′ ≠ ±ℓ″ are different
 * divisors (their tangent hyperplanes ℓ′·z = 0 and ℓ″·z = 0 differ). The order of the
 * quotient Π ϑ(τ, ℓ_i·z)^{e_i} along the component {ℓ′·z ≡ t} is therefore the sum of
 * e_i over the factors of direction ±ℓ′ whose a_i-torsion contains t — exactly the
 * one-variable count of MATH.md §3 for that direction, with a_i = |multiple| (ϑ is odd,
 * so the sign of ℓ_i is a constant factor). A meromorphic function on a complex
 * manifold is holomorphic iff its divisor is effective, so the quotient is holomorphic
 * iff the one-variable rule holds in every direction. Powers of η have no zeros and do
 * not enter.
 */
import { gcdNumber } from '../series/index.js';
import { thetaQuotientHolomorphic } from './divisor-rule.js';

export interface MultiThetaFactor {
  /** ℓ in ϑ(τ, ℓ·z), integral, non-zero. */
  readonly l: readonly number[];
  readonly exponent: number;
}

export interface MultiDivisorRuleResult {
  readonly holomorphic: boolean;
  /** When not holomorphic: a primitive direction, a torsion order d there with negative order, and that order. */
  readonly pole?: { readonly direction: readonly number[]; readonly d: number; readonly order: number };
}

/**
 * ℓ = multiple · direction with direction primitive and its first non-zero entry
 * positive; multiple is a non-zero integer (negative when ℓ points the other way).
 * Throws a RangeError for ℓ = 0 (ϑ(τ, 0) is the zero function) or non-integral ℓ.
 */
export function primitiveDirection(l: readonly number[]): { direction: number[]; multiple: number } {
  if (!l.every((x) => Number.isSafeInteger(x))) throw new RangeError('primitiveDirection: ℓ must be integral');
  let g = 0;
  for (const x of l) g = gcdNumber(g, x);
  if (g === 0) throw new RangeError('primitiveDirection: ℓ = 0');
  const first = l.find((x) => x !== 0)!;
  const multiple = first > 0 ? g : -g;
  return { direction: l.map((x) => x / multiple + 0), multiple };
}

export function thetaQuotientHolomorphicMulti(factors: readonly MultiThetaFactor[]): MultiDivisorRuleResult {
  const groups = new Map<string, { direction: number[]; factors: { a: number; exponent: number }[] }>();
  for (const f of factors) {
    const { direction, multiple } = primitiveDirection(f.l);
    const key = direction.join(',');
    let g = groups.get(key);
    if (g === undefined) {
      g = { direction, factors: [] };
      groups.set(key, g);
    }
    g.factors.push({ a: Math.abs(multiple), exponent: f.exponent });
  }
  for (const g of groups.values()) {
    const r = thetaQuotientHolomorphic(g.factors);
    if (!r.holomorphic) return { holomorphic: false, pole: { direction: g.direction, d: r.pole!.d, order: r.pole!.order } };
  }
  return { holomorphic: true };
}
