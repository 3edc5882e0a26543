/**
 * Holomorphy at the cusp in several variables, and the constant ρ of Theorem B
 * (MATH.md §6, "Several variables: the same with x − ¼ℓᵀM⁻¹ℓ and representatives of ℓ
 * modulo 2MZⁿ").
 *
 * For a form of index M (positive definite, 2M integral) and Heisenberg vector
 * c ≡ diag(2M) (mod 2), the elliptic transformation law gives, for λ ∈ Zⁿ,
 *   c(x + λᵀℓ + λᵀMλ, ℓ + 2Mλ) = ±c(x, ℓ),
 * and the hyperbolic norm N = x − ¼ℓᵀM⁻¹ℓ is invariant under this move (expand
 * ¼(ℓ + 2Mλ)ᵀM⁻¹(ℓ + 2Mλ) = ¼ℓᵀM⁻¹ℓ + λᵀℓ + λᵀMλ). So a coefficient depends (up to
 * sign) only on N and the class γ of ℓ in (c/2 + Zⁿ)/2MZⁿ. Within a class, the
 * representative with least ¼ℓᵀM⁻¹ℓ =: m_γ carries the coefficient at q-exponent
 * x = N + m_γ ≤ N + ρ, ρ = max_γ m_γ. Hence every coefficient with N ≤ B is, up to sign,
 * one with x ≤ B + ρ. A weak form is holomorphic iff c(x, ℓ) = 0 whenever N < 0, a
 * cusp form iff also whenever N = 0; both are decided by the coefficients with x ≤ ρ.
 *
 * Computing m_γ: write ℓ = w + 2My with w = c/2 + v a class representative, y ∈ Zⁿ. Then
 * ¼ℓᵀM⁻¹ℓ = (y − t)ᵀM(y − t) with t = −½M⁻¹w, so m_γ is the squared M-distance from t
 * to the lattice Zⁿ: a closest-vector problem, solved exactly by enumeration
 * (Fincke–Pohst with the LDLᵀ form of M, integer ranges found by exact comparisons, no
 * floating point). When there are more than CLASS_LIMIT classes, ρ is replaced by the
 * nearest-plane bound ¼Σd_i (d_i the LDLᵀ pivots), which is ≥ every m_γ: rounding the
 * coordinates from the last to the first makes each term d_i(y_i − c_i)² ≤ d_i/4. An
 * upper bound of ρ is sound — a larger q-order compares a superset of the coefficients.
 */
import {
  type Rational,
  type Int,
  JSBI,
  rat,
  radd,
  rsub,
  rmul,
  rcmp,
  rfloor,
  rational,
} from '../series/index.js';
import type { Holomorphy } from './holomorphy.js';
import { heisenbergCharacter } from './modular-type.js';
import {
  type RationalMatrix,
  bilinear,
  isPositiveDefinite,
  ldlDecomposition,
  latticeClassRepresentatives,
  matrixInverse,
  matrixVector,
  twiceIntegral,
} from './matrix.js';

/** More classes than this and ρ is bounded by the nearest-plane bound instead. */
export const CLASS_LIMIT = 4096;

export interface IndexRho {
  /** ρ = max_γ min_{ℓ∈γ} ¼ℓᵀM⁻¹ℓ, or an upper bound of it when `exact` is false. */
  readonly rho: Rational;
  readonly exact: boolean;
  /** |det 2M|, the number of classes. */
  readonly classes: number;
}

/** c ≡ diag(2M) (mod 2) for an index with 2M integral (MATH.md §3). */
export function heisenbergVector(M: RationalMatrix): number[] {
  twiceIntegral(M, 'heisenbergVector');
  return heisenbergCharacter({ weight: rat(0), index: M, etaPower: 0 });
}

/**
 * min over y ∈ Zⁿ of (y − t)ᵀA(y − t) for A positive definite, exactly: returns the
 * minimum and a minimiser.
 */
export function closestVectorDistance(A: RationalMatrix, t: readonly Rational[]): { value: Rational; y: Int[] } {
  const ldl = ldlDecomposition(A);
  if (ldl === null) throw new RangeError('closestVectorDistance: matrix is not positive definite');
  const { d, mu } = ldl;
  const n = A.length;
  const y: Int[] = Array.from({ length: n }, () => JSBI.BigInt(0));
  const u: Rational[] = Array.from({ length: n }, () => rat(0));
  const center = (i: number): Rational => {
    let c = t[i]!;
    for (let j = i + 1; j < n; j++) c = rsub(c, rmul(mu[i]![j]!, u[j]!));
    return c;
  };
  const term = (i: number, yi: Int, c: Rational): Rational => {
    const diff = rsub(rational(yi), c);
    return rmul(d[i]!, rmul(diff, diff));
  };
  // Nearest plane (Babai): the first candidate.
  let best = rat(0);
  for (let i = n - 1; i >= 0; i--) {
    const c = center(i);
    const yi = rfloor(radd(c, rat(1, 2)));
    y[i] = yi;
    u[i] = rsub(rational(yi), t[i]!);
    best = radd(best, term(i, yi, c));
  }
  let bestY = [...y];
  // Exhaustive search for anything strictly smaller.
  const search = (i: number, partial: Rational): void => {
    if (i < 0) {
      if (rcmp(partial, best) < 0) {
        best = partial;
        bestY = [...y];
      }
      return;
    }
    const c = center(i);
    const start = rfloor(c);
    const visit = (yi: Int): boolean => {
      const s = radd(partial, term(i, yi, c));
      if (rcmp(s, best) >= 0) return false;
      y[i] = yi;
      u[i] = rsub(rational(yi), t[i]!);
      search(i - 1, s);
      return true;
    };
    // (y − c)² is convex in y: walk outward from ⌊c⌋ and ⌊c⌋ + 1 while the bound holds.
    for (let yi = start; visit(yi); yi = JSBI.subtract(yi, JSBI.BigInt(1)));
    for (let yi = JSBI.add(start, JSBI.BigInt(1)); visit(yi); yi = JSBI.add(yi, JSBI.BigInt(1)));
  };
  search(n - 1, rat(0));
  return { value: best, y: bestY };
}

/** The least ¼ℓᵀM⁻¹ℓ over ℓ ∈ w + 2MZⁿ, and a minimising ℓ. */
export function cosetMinimum(M: RationalMatrix, w: readonly Rational[]): { value: Rational; l: Rational[] } {
  const Minv = matrixInverse(M);
  if (Minv === null || !isPositiveDefinite(M)) throw new RangeError('cosetMinimum: index matrix is not positive definite');
  const t = matrixVector(Minv, w).map((x) => rmul(x, rat(-1, 2)));
  const { value, y } = closestVectorDistance(M, t);
  const My = matrixVector(M, y.map((k) => rational(k)));
  const l = w.map((x, i) => radd(x, rmul(rat(2), My[i]!)));
  return { value, l };
}

/** ¼ℓᵀM⁻¹ℓ. */
export function quarterNorm(l: readonly Rational[], Minv: RationalMatrix): Rational {
  return rmul(rat(1, 4), bilinear(l, Minv, l));
}

/** Representatives w = c/2 + v of (c/2 + Zⁿ)/2MZⁿ, or null when more than `limit`. */
export function indexClassRepresentatives(M: RationalMatrix, limit = Infinity): Rational[][] | null {
  const two = twiceIntegral(M, 'indexClassRepresentatives');
  const c = heisenbergVector(M);
  const reps = latticeClassRepresentatives(two, limit);
  if (reps === null) return null;
  return reps.map((v) => v.map((k, i) => radd(rat(k), rat(c[i]!, 2))));
}

/**
 * ρ = max over classes γ ∈ (c/2 + Zⁿ)/2MZⁿ of min_{ℓ∈γ} ¼ℓᵀM⁻¹ℓ for a positive
 * definite M with 2M integral (RangeError otherwise). The 0×0 index gives 0.
 */
export function indexRho(M: RationalMatrix, classLimit = CLASS_LIMIT): IndexRho {
  const ldl = ldlDecomposition(M);
  if (ldl === null) throw new RangeError('indexRho: index matrix is not positive definite');
  if (M.length === 0) return { rho: rat(0), exact: true, classes: 1 };
  const reps = indexClassRepresentatives(M, classLimit);
  if (reps === null) {
    let bound = rat(0);
    for (const di of ldl.d) bound = radd(bound, rmul(di, rat(1, 4)));
    return { rho: bound, exact: false, classes: Infinity };
  }
  let rho = rat(0);
  for (const w of reps) {
    const { value } = cosetMinimum(M, w);
    if (rcmp(value, rho) > 0) rho = value;
  }
  return { rho, exact: true, classes: reps.length };
}

/**
 * The q-order up to which coefficients decide `holomorphic` / `cusp` for a positive
 * definite index M (ρ above, or its upper bound); 0 for `weak` (only x < 0 matters).
 * Throws a RangeError for an M that is not positive definite (the caller reports the
 * question unsupported).
 */
export function holomorphyOrderMatrix(property: Holomorphy, M: RationalMatrix): Rational {
  if (!isPositiveDefinite(M)) throw new RangeError('holomorphyOrderMatrix: index matrix is not positive definite');
  if (property === 'weak') return rat(0);
  return indexRho(M).rho;
}

/**
 * Whether c(x, ℓ) must vanish for a form with the property, given M⁻¹ (M positive
 * definite): weak: x < 0; holomorphic: x − ¼ℓᵀM⁻¹ℓ < 0; cusp: ≤ 0. (For positive definite
 * M, x < 0 already gives a negative norm, so holomorphic implies weak.)
 */
export function mustVanishVector(property: Holomorphy, x: Rational, l: readonly Rational[], Minv: RationalMatrix): boolean {
  if (rcmp(x, rat(0)) < 0) return true;
  if (property === 'weak') return false;
  const norm = rsub(x, quarterNorm(l, Minv));
  const s = rcmp(norm, rat(0));
  return property === 'holomorphic' ? s < 0 : s <= 0;
}

