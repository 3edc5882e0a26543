/**
 * Theta series of an even positive definite lattice (MATH.md §2):
 *   Θ_G(τ, w) = Σ_{x ∈ Zⁿ} q^{xᵀGx/2} ζ_w^{Gx},
 * in n variables w, weight n/2 and index G/2. The vectors with xᵀGx/2 ≤ X are listed by
 * the Fincke–Pohst enumeration (Fincke–Pohst, *Improved methods for calculating vectors
 * of short length in a lattice*, Math. Comp. 44, 1985): writing
 * Q(x) = Σ_i q_ii (x_i + Σ_{j>i} q_ij x_j)², each coordinate is bounded in turn. The
 * bounds are computed in floating point with a safety margin and every vector is then
 * tested exactly with integers, so the list is exact.
 */
import {
  type QZSeries,
  type Rational,
  type Slice,
  JSBI,
  ONE,
  int,
  rat,
  rfloor,
  toNumber,
  makeSeries,
  sliceCountTo,
  sparseSlice,
  EMPTY_SLICE,
  trimSlice,
  zeroSeries,
  rcmp,
} from '../series/index.js';

/** q_ii and q_ij of the completed-square form of Q(x) = xᵀGx/2 (floating point). */
function completeSquares(G: readonly (readonly number[])[]): number[][] {
  const n = G.length;
  const q = G.map((row) => row.map((x) => x / 2));
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      q[j]![i] = q[i]![j]!;
      q[i]![j] = q[i]![j]! / q[i]![i]!;
    }
    for (let k = i + 1; k < n; k++) for (let l = k; l < n; l++) q[k]![l] = q[k]![l]! - q[k]![i]! * q[i]![l]!;
  }
  return q;
}

/** Every x ∈ Zⁿ with xᵀGx/2 ≤ bound, found exactly. */
export function shortVectors(G: readonly (readonly number[])[], bound: number): number[][] {
  const n = G.length;
  const q = completeSquares(G);
  const slack = 1e-9 * (1 + bound);
  const out: number[][] = [];
  const x = new Array<number>(n).fill(0);
  const exactNorm = (v: readonly number[]): number => {
    let s = 0;
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) s += v[i]! * G[i]![j]! * v[j]!;
    return s / 2;
  };
  const search = (i: number, remaining: number): void => {
    let centre = 0;
    for (let j = i + 1; j < n; j++) centre += q[i]![j]! * x[j]!;
    const radius = Math.sqrt(Math.max(0, remaining + slack) / q[i]![i]!);
    const lo = Math.ceil(-centre - radius - 1e-9);
    const hi = Math.floor(-centre + radius + 1e-9);
    for (let v = lo; v <= hi; v++) {
      x[i] = v;
      const t = v + centre;
      const rest = remaining - q[i]![i]! * t * t;
      if (rest < -slack) continue;
      if (i === 0) {
        if (exactNorm(x) <= bound) out.push([...x]);
      } else search(i - 1, rest);
    }
    x[i] = 0;
  };
  search(n - 1, bound);
  return out;
}

/** Θ_G to q-order X, in n = rank G variables (ζ-exponents Gx, stored in halves). */
export function latticeThetaSeries(G: readonly (readonly number[])[], X: Rational): QZSeries {
  const n = G.length;
  if (rcmp(X, rat(0)) < 0) return zeroSeries(X, rat(0), 1, n);
  const count = sliceCountTo(rat(0), 1, X);
  const rows: { e: number[][]; v: ReturnType<typeof int>[] }[] = Array.from({ length: count }, () => ({ e: [], v: [] }));
  for (const x of shortVectors(G, toNumber(rfloor(X)))) {
    let norm = 0;
    const gx = G.map((row) => row.reduce((s, g, j) => s + g * x[j]!, 0));
    for (let i = 0; i < n; i++) norm += x[i]! * gx[i]!;
    const row = rows[norm / 2]!;
    row.e.push(gx.map((y) => 2 * y));
    row.v.push(ONE);
  }
  const slices: Slice[] = rows.map((r) => {
    if (r.v.length === 0) return EMPTY_SLICE;
    if (n > 1) return sparseSlice(n, r.e, r.v);
    const keys = r.e.map((e) => e[0]!);
    const lo = Math.min(...keys);
    const c = new Array(Math.max(...keys) - lo + 1).fill(int(0));
    keys.forEach((k) => (c[k - lo] = JSBI.add(c[k - lo], ONE)));
    return trimSlice(lo, c);
  });
  return makeSeries(rat(0), 1, ONE, slices, X, n);
}
