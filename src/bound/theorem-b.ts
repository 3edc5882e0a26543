/**
 * Theorem B (MATH.md §6): let F have weight K, index matrix M (n variables; 2M
 * integral, M positive semi-definite), multiplier v_η^D times the Heisenberg character
 * of M, and be holomorphic on H × Cⁿ (weakly holomorphic in τ). Split off ker M and let
 * r = rank M, M′ the r×r positive definite remainder. Then F = 0 as soon as every
 * coefficient c(x, ℓ) of F with q-exponent x ≤ X vanishes, where
 *   X = K/12                                   if r = 0 (Sturm; reported as Theorem A),
 *   X = min((K + 2m)/12, (K − ½)/12 + ρ)       if r = 1, m = M′ (Theorem A or B),
 *   X = (K − r/2)/12 + ρ                        if r ≥ 2,
 * ρ = max over classes γ ∈ (c/2 + Z^r)/2M′Z^r (c ≡ diag(2M′) mod 2, the Heisenberg
 * vector of M′) of min_{ℓ∈γ} ¼ℓᵀM′⁻¹ℓ.
 *
 * Proof (restated from MATH.md §6).
 * 0. Kernel split. With U integral unimodular and UᵀMU = diag(M′, 0) (`integralKernelSplit`),
 *    put F′(τ, z′) = F(τ, Uz′). For λ ∈ ker M ∩ Zⁿ the elliptic law has no index factor
 *    (λᵀMλ = 0, Mλ = 0) and a trivial Heisenberg sign (c·λ ≡ 2λᵀMλ ≡ 0 mod 2, since 2M
 *    is integral with off-diagonal 4M_ij even), so F′ is doubly periodic and holomorphic
 *    in z′_{r+1..n}, hence constant there (Liouville on the compact torus). F′ is thus a
 *    form in r variables of index M′. Its coefficients are F's, re-indexed by the
 *    bijection ℓ ↦ Uᵀℓ with the same q-exponent x, so "all coefficients with x ≤ X
 *    vanish" means the same for F and F′. This is why the kernel is split off and n is
 *    replaced by r: a pseudo-inverse with n = the number of declared variables would
 *    lower the bound by (n − r)/24 — for `Delta == 0` in two variables it gives 11/12
 *    and compares nothing at q¹, where Δ has its first coefficient; X = 12/12 = 1 does.
 * 1. r = 0: F′ is a scalar modular form of weight K (times v_η^D); Sturm's theorem for
 *    SL₂(Z): a non-zero form has ord_∞ ≤ K/12.
 * 2. r ≥ 1 (Theorem B for F′, M′ positive definite). Multiply by Δ^s to make F′Δ^s
 *    holomorphic at the cusp. Theta decomposition: F′Δ^s = Σ_γ h_γ(τ) Θ_{M′,γ}(τ, z′),
 *    h_γ(τ) = Σ_N c_γ(N) q^N, where c(x, ℓ) = ±c_γ(x − ¼ℓᵀM′⁻¹ℓ) for ℓ ∈ γ (the
 *    coefficients depend, up to the Heisenberg sign, only on the hyperbolic norm and the
 *    class of ℓ mod 2M′Z^r). (h_γ) is a vector-valued modular form of weight K + 12s − r/2
 *    for a representation of Mp₂(Z) with finite image. If every component has
 *    ord_∞ > weight/12, then h = 0: for a component h_γ ≠ 0 the product of h_γ|A over
 *    the cosets A of the kernel of the representation is a scalar form on SL₂(Z) whose
 *    order at ∞ would exceed its weight/12 (each h_γ|A is a combination of components),
 *    contradicting the valence formula. The factor Δ^s adds 12s to the weight and s to
 *    every norm, so it cancels: F′ = 0 once c(x, ℓ) = 0 for every norm
 *    x − ¼ℓᵀM′⁻¹ℓ ≤ (K − r/2)/12.
 * 3. From norms to a q-order. Within a class γ the move ℓ ↦ ℓ + 2M′λ keeps the norm
 *    and the coefficient (up to sign); the representative with least ¼ℓᵀM′⁻¹ℓ = m_γ ≤ ρ
 *    carries each norm N at x = N + m_γ ≤ N + ρ. So the coefficients with
 *    x ≤ X = (K − r/2)/12 + ρ include, up to sign, one for every (γ, N) with
 *    N ≤ (K − r/2)/12. Comparing every coefficient up to q-order X — a superset of the
 *    ones with norm within the bound; the extra ones vanish anyway when F = 0 — is
 *    therefore enough. An upper bound of ρ is equally sound (a larger q-order compares a
 *    superset), but never a smaller value: `indexRho` is exact up to CLASS_LIMIT classes
 *    and otherwise uses the nearest-plane bound, which is ≥ ρ.
 * 4. r = 1: Theorem A (MATH.md §6) also applies to F′ with m = M′; it needs
 *    (K + 2m)/12 against B's (K − ½)/12 + m/4 (ρ = m/4 in one variable: the class of
 *    r ≡ m mod 2m has least r²/4m = m/4), i.e. m/12 − 1/24 less whenever m > ½. The
 *    smaller of the two is used; a tie goes to A. ∎
 * An indefinite M (RangeError from the split) or a non-integral 2M (RangeError) is
 * outside both theorems; the caller reports it as unsupported.
 */
import { type Rational, rat, radd, rsub, rdiv, rcmp, rationalToString } from '../series/index.js';
import { type IndexMatrix, formatIndex } from '../types/modular-type.js';
import { integralKernelSplit, twiceIntegral, isSymmetric } from '../types/matrix.js';
import { indexRho } from '../types/holomorphy-matrix.js';
import { theoremABound } from './theorem-a.js';

export interface TheoremBResult {
  readonly theorem: 'A' | 'B';
  /** Compare every coefficient with q-exponent ≤ qOrder. */
  readonly qOrder: Rational;
  /** rank M (the number of variables after splitting off ker M). */
  readonly rank: number;
  /** ρ of M′ (exact, or an upper bound when the derivation says so); 0 for rank 0. */
  readonly rho: Rational;
  readonly derivation: string;
}

export function theoremBBound(weight: Rational, M: IndexMatrix): TheoremBResult {
  if (!isSymmetric(M)) throw new RangeError('theoremBBound: index matrix is not symmetric');
  twiceIntegral(M, 'theoremBBound');
  const n = M.length;
  const K = rationalToString(weight);
  const split = integralKernelSplit(M);
  const r = split.rank;
  const kernelText = r < n ? `; ker M of dimension ${n - r} split off (M′ = ${formatIndex(split.reduced)})` : '';
  if (r === 0) {
    const qOrder = rdiv(weight, rat(12));
    return {
      theorem: 'A',
      qOrder,
      rank: 0,
      rho: rat(0),
      derivation: `index of rank 0 in ${n} variable(s)${kernelText}: Sturm's bound K/12 = ${K}/12 = ${rationalToString(qOrder)}`,
    };
  }
  const rho = indexRho(split.reduced);
  const rhoText = rho.exact
    ? `ρ = ${rationalToString(rho.rho)} (exact, ${rho.classes} class${rho.classes === 1 ? '' : 'es'})`
    : `ρ ≤ ${rationalToString(rho.rho)} (nearest-plane upper bound; too many classes to enumerate)`;
  const xB = radd(rdiv(rsub(weight, rat(r, 2)), rat(12)), rho.rho);
  const textB = `Theorem B: (K − r/2)/12 + ρ = (${K} − ${r}/2)/12 + ${rationalToString(rho.rho)} = ${rationalToString(xB)}`;
  const head = `index of rank ${r} in ${n} variable(s)${kernelText}; ${rhoText}`;
  if (r === 1) {
    const m = split.reduced[0]![0]!;
    const xA = theoremABound(weight, m);
    const textA = `Theorem A: (K + 2m)/12 = (${K} + 2·${rationalToString(m)})/12 = ${rationalToString(xA)}`;
    if (rcmp(xA, xB) <= 0) {
      return { theorem: 'A', qOrder: xA, rank: 1, rho: rho.rho, derivation: `${head}; ${textA} (≤ ${textB})` };
    }
    return { theorem: 'B', qOrder: xB, rank: 1, rho: rho.rho, derivation: `${head}; ${textB} (< ${textA})` };
  }
  return { theorem: 'B', qOrder: xB, rank: r, rho: rho.rho, derivation: `${head}; ${textB}` };
}

