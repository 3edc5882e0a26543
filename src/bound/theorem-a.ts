/**
 * Theorem A (MATH.md §6): let F have weight K, index m ≥ 0 (one variable),
 * multiplier v_η^D·v_H^{2m}, and be holomorphic in z (weakly holomorphic in τ). If
 * every coefficient c(x, r) of F with x ≤ (K + 2m)/12 vanishes, then F = 0.
 *
 * Proof (restated from MATH.md §6).
 * 1. Multiply by ϑ^ε η^e Δ^s (ε = 2m mod 2, e ≡ −(D + 3ε) mod 24, s large) to get G,
 *    a weak Jacobi form with trivial multiplier, integral weight K′ and integral index
 *    m′. Each factor's lowest q-slice is q^δ·(a non-zero Laurent polynomial in ζ), so
 *    the multiplication is injective on q-slices and shifts exponents by
 *    δ = ε/8 + e/24 + s.
 * 2. A weak Jacobi form G of weight K′ and index m′ is determined by its modified
 *    Taylor coefficients g_0 … g_{2m′} (MATH.md §5): if they vanish, G(τ, ·) has a zero
 *    of order > 2m′ at z = 0, but a non-zero theta function of index m′ has exactly
 *    2m′ zeros in a period parallelogram (Eichler–Zagier 1985, Thm 1.2 and §3).
 * 3. g_ν ∈ M_{K′+ν} (holomorphic at ∞ because G is weak) and its expansion to q^X uses
 *    only coefficients of G with x ≤ X. By Sturm's theorem for SL₂(Z) a non-zero form of
 *    weight w has ord_∞ ≤ w/12, so G = 0 once its coefficients vanish for
 *    x ≤ (K′ + 2m′)/12.
 * 4. Back to F: K′ = K + ε/2 + e/2 + 12s, m′ = m + ε/2, δ = ε/8 + e/24 + s, and
 *    (K′ + 2m′)/12 − δ = (K + 2m)/12. ∎
 * Index 0 gives Sturm's bound K/12; a negative bound means F = 0 already
 * (J^{weak}_{k,m} = 0 for k < −2m); negative q-exponents are all inside the bound.
 */
import { type Rational, rat, radd, rmul, rdiv } from '../series/index.js';

export function theoremABound(weight: Rational, index: Rational): Rational {
  return rdiv(radd(weight, rmul(rat(2), index)), rat(12));
}
