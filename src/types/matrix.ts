/**
 * Exact rational matrix utilities for index matrices (MATH.md §3, §6): rank,
 * determinant, inverse, definiteness by symmetric elimination (LDLᵀ), even Gram
 * matrices, and the integral splitting-off of the kernel of a positive
 * semi-definite index that Theorem B needs.
 *
 * Everything is exact (Rational over JSBI); no floating point decides anything here.
 */
import {
  type Rational,
  type Int,
  JSBI,
  ZERO,
  ONE,
  int,
  isZero,
  sign,
  lcm,
  isSafe,
  rat,
  radd,
  rsub,
  rmul,
  rdiv,
  rneg,
  rcmp,
  req,
  rIsZero,
  rIsInteger,
} from '../series/index.js';

/** A rational matrix, row-major (the same shape as `IndexMatrix`). */
export type RationalMatrix = readonly (readonly Rational[])[];

function copy(A: RationalMatrix): Rational[][] {
  return A.map((row) => [...row]);
}

function isSquare(A: RationalMatrix): boolean {
  return A.every((row) => row.length === A.length);
}

function requireSquare(A: RationalMatrix, what: string): void {
  if (!isSquare(A)) throw new RangeError(`${what}: matrix is not square`);
}

/** A rational matrix from small integers or rationals given as [num, den]. */
export function ratMatrix(rows: readonly (readonly (number | readonly [number, number])[])[]): Rational[][] {
  return rows.map((row) => row.map((x) => (typeof x === 'number' ? rat(x) : rat(x[0], x[1]))));
}

export function identityMatrix(n: number): Rational[][] {
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => rat(i === j ? 1 : 0)));
}

export function transpose(A: RationalMatrix): Rational[][] {
  const cols = A[0]?.length ?? 0;
  return Array.from({ length: cols }, (_, j) => A.map((row) => row[j]!));
}

export function matrixMultiply(A: RationalMatrix, B: RationalMatrix): Rational[][] {
  const inner = B.length;
  const cols = B[0]?.length ?? 0;
  return A.map((row) => {
    if (row.length !== inner) throw new RangeError('matrixMultiply: shapes do not match');
    return Array.from({ length: cols }, (_, j) => {
      let s = rat(0);
      for (let k = 0; k < inner; k++) s = radd(s, rmul(row[k]!, B[k]![j]!));
      return s;
    });
  });
}

/** UᵀMU for an integral (number) matrix U. */
export function congruence(M: RationalMatrix, U: readonly (readonly number[])[]): Rational[][] {
  const Ur = U.map((row) => row.map((x) => rat(x)));
  return matrixMultiply(matrixMultiply(transpose(Ur), M), Ur);
}

/** A matrix-vector product Av. */
export function matrixVector(A: RationalMatrix, v: readonly Rational[]): Rational[] {
  return A.map((row) => {
    let s = rat(0);
    row.forEach((x, j) => (s = radd(s, rmul(x, v[j]!))));
    return s;
  });
}

/** The quadratic form vᵀAw. */
export function bilinear(v: readonly Rational[], A: RationalMatrix, w: readonly Rational[]): Rational {
  let s = rat(0);
  const Aw = matrixVector(A, w);
  v.forEach((x, i) => (s = radd(s, rmul(x, Aw[i]!))));
  return s;
}

export function isSymmetric(A: RationalMatrix): boolean {
  return isSquare(A) && A.every((row, i) => row.every((x, j) => req(x, A[j]![i]!)));
}

/** Rank by Gaussian elimination (any shape). */
export function matrixRank(A: RationalMatrix): number {
  const R = copy(A);
  const rows = R.length;
  const cols = R[0]?.length ?? 0;
  let rank = 0;
  for (let c = 0; c < cols && rank < rows; c++) {
    let p = -1;
    for (let i = rank; i < rows; i++) if (!rIsZero(R[i]![c]!)) { p = i; break; }
    if (p < 0) continue;
    [R[rank], R[p]] = [R[p]!, R[rank]!];
    const pivot = R[rank]![c]!;
    for (let i = rank + 1; i < rows; i++) {
      const f = rdiv(R[i]![c]!, pivot);
      if (rIsZero(f)) continue;
      for (let j = c; j < cols; j++) R[i]![j] = rsub(R[i]![j]!, rmul(f, R[rank]![j]!));
    }
    rank++;
  }
  return rank;
}

/** det A by Gaussian elimination with row swaps (square A; det of the 0×0 matrix is 1). */
export function determinant(A: RationalMatrix): Rational {
  requireSquare(A, 'determinant');
  const R = copy(A);
  const n = R.length;
  let det = rat(1);
  for (let c = 0; c < n; c++) {
    let p = -1;
    for (let i = c; i < n; i++) if (!rIsZero(R[i]![c]!)) { p = i; break; }
    if (p < 0) return rat(0);
    if (p !== c) {
      [R[c], R[p]] = [R[p]!, R[c]!];
      det = rneg(det);
    }
    const pivot = R[c]![c]!;
    det = rmul(det, pivot);
    for (let i = c + 1; i < n; i++) {
      const f = rdiv(R[i]![c]!, pivot);
      if (rIsZero(f)) continue;
      for (let j = c; j < n; j++) R[i]![j] = rsub(R[i]![j]!, rmul(f, R[c]![j]!));
    }
  }
  return det;
}

/** A⁻¹ by Gauss–Jordan elimination; null when A is singular. */
export function matrixInverse(A: RationalMatrix): Rational[][] | null {
  requireSquare(A, 'matrixInverse');
  const n = A.length;
  const R = A.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => rat(i === j ? 1 : 0))]);
  for (let c = 0; c < n; c++) {
    let p = -1;
    for (let i = c; i < n; i++) if (!rIsZero(R[i]![c]!)) { p = i; break; }
    if (p < 0) return null;
    [R[c], R[p]] = [R[p]!, R[c]!];
    const pivot = R[c]![c]!;
    R[c] = R[c]!.map((x) => rdiv(x, pivot));
    for (let i = 0; i < n; i++) {
      if (i === c) continue;
      const f = R[i]![c]!;
      if (rIsZero(f)) continue;
      R[i] = R[i]!.map((x, j) => rsub(x, rmul(f, R[c]![j]!)));
    }
  }
  return R.map((row) => row.slice(n));
}

/**
 * The LDLᵀ data of a positive definite symmetric A: pivots d_i > 0 and multipliers
 * μ_ij (j > i) with vᵀAv = Σ_i d_i (v_i + Σ_{j>i} μ_ij v_j)². Null when A is not
 * symmetric positive definite. (Sylvester: A is positive definite iff symmetric
 * elimination without row exchanges meets only positive pivots.)
 */
export function ldlDecomposition(A: RationalMatrix): { d: Rational[]; mu: Rational[][] } | null {
  if (!isSymmetric(A)) return null;
  const n = A.length;
  const S = copy(A);
  const d: Rational[] = [];
  const mu: Rational[][] = Array.from({ length: n }, () => Array.from({ length: n }, () => rat(0)));
  for (let i = 0; i < n; i++) {
    const p = S[i]![i]!;
    if (rcmp(p, rat(0)) <= 0) return null;
    d.push(p);
    for (let j = i + 1; j < n; j++) mu[i]![j] = rdiv(S[i]![j]!, p);
    for (let j = i + 1; j < n; j++) {
      for (let k = i + 1; k < n; k++) S[j]![k] = rsub(S[j]![k]!, rmul(S[j]![i]!, mu[i]![k]!));
    }
  }
  return { d, mu };
}

export function isPositiveDefinite(A: RationalMatrix): boolean {
  return ldlDecomposition(A) !== null;
}

/**
 * Positive semi-definiteness by symmetric elimination: a negative pivot means
 * indefinite; a zero pivot is allowed only when its whole row of the current Schur
 * complement is zero (for a PSD matrix a zero diagonal entry forces a zero row, as
 * the 2×2 minors a_ii a_jj − a_ij² must be ≥ 0); a positive pivot is eliminated, and
 * the Schur complement of a positive pivot is PSD iff the matrix is (congruence).
 */
export function isPositiveSemidefinite(A: RationalMatrix): boolean {
  if (!isSymmetric(A)) return false;
  const n = A.length;
  const S = copy(A);
  for (let i = 0; i < n; i++) {
    const p = S[i]![i]!;
    const s = rcmp(p, rat(0));
    if (s < 0) return false;
    if (s === 0) {
      for (let j = i + 1; j < n; j++) if (!rIsZero(S[i]![j]!)) return false;
      continue;
    }
    for (let j = i + 1; j < n; j++) {
      const f = rdiv(S[j]![i]!, p);
      if (rIsZero(f)) continue;
      for (let k = i + 1; k < n; k++) S[j]![k] = rsub(S[j]![k]!, rmul(f, S[i]![k]!));
    }
  }
  return true;
}

/** G integral, symmetric, with even diagonal (the Gram matrix of an even lattice when also positive definite). */
export function isEvenGram(G: RationalMatrix): boolean {
  if (!isSymmetric(G)) return false;
  return G.every((row, i) =>
    row.every((x) => rIsInteger(x)) && JSBI.equal(JSBI.remainder(row[i]!.num, int(2)), ZERO),
  );
}

// ---------------------------------------------------------------------------
// Integral column reduction (Hermite-style), kernel split, class representatives.

/** [g, x, y] with g = gcd(a, b) ≥ 0 and x·a + y·b = g. */
function extendedGcd(a: Int, b: Int): [Int, Int, Int] {
  let [r0, r1] = [a, b];
  let [s0, s1] = [ONE, ZERO];
  let [t0, t1] = [ZERO, ONE];
  while (!isZero(r1)) {
    const q = JSBI.divide(r0, r1);
    [r0, r1] = [r1, JSBI.subtract(r0, JSBI.multiply(q, r1))];
    [s0, s1] = [s1, JSBI.subtract(s0, JSBI.multiply(q, s1))];
    [t0, t1] = [t1, JSBI.subtract(t0, JSBI.multiply(q, t1))];
  }
  if (sign(r0) < 0) return [JSBI.unaryMinus(r0), JSBI.unaryMinus(s0), JSBI.unaryMinus(t0)];
  return [r0, s0, t0];
}

/** Integral scaling of a rational matrix: d·A with d the lcm of the denominators. */
export function integralMultiple(A: RationalMatrix): Int[][] {
  let d = ONE;
  for (const row of A) for (const x of row) d = lcm(d, x.den);
  return A.map((row) => row.map((x) => JSBI.divide(JSBI.multiply(x.num, d), x.den)));
}

export interface ColumnEchelon {
  /** H = A·V, in column echelon form: columns ≥ rank are zero; in the pivot rows the pivot is positive and entries right of it are zero. */
  readonly H: Int[][];
  /** Unimodular (det ±1) integral n×n matrix. */
  readonly V: Int[][];
  readonly rank: number;
  /** pivotRows[j] = the row of column j's pivot, j < rank. */
  readonly pivotRows: number[];
}

/**
 * Unimodular column reduction of an integral m×n matrix A: A·V = H with V integral and
 * det V = ±1, H's last n − rank columns zero. Row by row, extended-gcd column
 * operations [[x, −b/g], [y, a/g]] (determinant 1) clear the entries right of the
 * current pivot column. For a square non-singular A, H is lower triangular with a
 * positive diagonal (the Hermite normal form up to the reduction below the diagonal).
 */
export function columnEchelon(A: readonly (readonly Int[])[]): ColumnEchelon {
  const m = A.length;
  const n = A[0]?.length ?? 0;
  const H = A.map((row) => [...row]);
  const V: Int[][] = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? ONE : ZERO)));
  const combine = (p: number, j: number, x: Int, y: Int, u: Int, v: Int): void => {
    // col_p ← x col_p + y col_j ; col_j ← u col_p + v col_j
    for (const M of [H, V]) {
      for (const row of M) {
        const cp = row[p]!;
        const cj = row[j]!;
        row[p] = JSBI.add(JSBI.multiply(x, cp), JSBI.multiply(y, cj));
        row[j] = JSBI.add(JSBI.multiply(u, cp), JSBI.multiply(v, cj));
      }
    }
  };
  let p = 0;
  const pivotRows: number[] = [];
  for (let i = 0; i < m && p < n; i++) {
    for (let j = p + 1; j < n; j++) {
      const b = H[i]![j]!;
      if (isZero(b)) continue;
      const a = H[i]![p]!;
      const [g, x, y] = extendedGcd(a, b);
      combine(p, j, x, y, JSBI.unaryMinus(JSBI.divide(b, g)), JSBI.divide(a, g));
    }
    if (isZero(H[i]![p]!)) continue;
    if (sign(H[i]![p]!) < 0) for (const M of [H, V]) for (const row of M) row[p] = JSBI.unaryMinus(row[p]!);
    // Size-reduce the earlier pivot columns against this one (keeps entries small).
    for (let k = 0; k < p; k++) {
      const q = floorDiv(H[i]![k]!, H[i]![p]!);
      if (isZero(q)) continue;
      for (const M of [H, V]) for (const row of M) row[k] = JSBI.subtract(row[k]!, JSBI.multiply(q, row[p]!));
    }
    pivotRows.push(i);
    p++;
  }
  return { H, V, rank: p, pivotRows };
}

function floorDiv(a: Int, b: Int): Int {
  const q = JSBI.divide(a, b);
  const r = JSBI.subtract(a, JSBI.multiply(q, b));
  if (!isZero(r) && sign(r) !== sign(b)) return JSBI.subtract(q, ONE);
  return q;
}

function toNumbers(A: readonly (readonly Int[])[]): number[][] {
  return A.map((row) =>
    row.map((x) => {
      if (!isSafe(x)) throw new RangeError('integralKernelSplit: entry exceeds the safe integer range');
      return JSBI.toNumber(x);
    }),
  );
}

export interface KernelSplit {
  /** Integral unimodular U (n×n, det ±1) with UᵀMU = diag(M′, 0). */
  readonly U: number[][];
  /** M′, r×r positive definite (r = rank M). */
  readonly reduced: Rational[][];
  readonly rank: number;
}

/**
 * Splits off ker M for a positive semi-definite rational symmetric M. Column-reduce the
 * integral multiple dM by a unimodular V: dM·V = [H | 0] with H of full column rank r.
 * The last n − r columns of V lie in ker M; they span ker M ∩ Zⁿ, because for an
 * integral kernel vector x the integral y = V⁻¹x satisfies H·y₁ = 0, so y₁ = 0. Put
 * U = V. Then MU has zero last n − r columns, and by symmetry UᵀMU = diag(M′, 0) with
 * M′ = U₁ᵀMU₁ positive semi-definite of rank r, hence positive definite.
 * Throws a RangeError for a non-symmetric or indefinite M.
 */
export function integralKernelSplit(M: RationalMatrix): KernelSplit {
  if (!isSymmetric(M)) throw new RangeError('integralKernelSplit: index matrix is not symmetric');
  if (!isPositiveSemidefinite(M)) throw new RangeError('integralKernelSplit: index matrix is indefinite');
  const n = M.length;
  const { V, rank } = columnEchelon(integralMultiple(M));
  const U = toNumbers(V);
  const full = congruence(M, U);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if ((i >= rank || j >= rank) && !rIsZero(full[i]![j]!)) throw new Error('integralKernelSplit: internal error, UᵀMU is not split');
    }
  }
  const reduced = full.slice(0, rank).map((row) => row.slice(0, rank));
  if (!isPositiveDefinite(reduced)) throw new Error('integralKernelSplit: internal error, M′ is not positive definite');
  return { U, reduced, rank };
}

/**
 * Representatives of Zⁿ / A·Zⁿ for an integral non-singular A: with A·V = H lower
 * triangular, positive diagonal h_i, the vectors v with 0 ≤ v_i < h_i form a complete
 * residue system (reduce x row by row with the columns of H; there are Π h_i = |det A|
 * of them). Returns null when there are more than `limit`.
 */
export function latticeClassRepresentatives(A: readonly (readonly Int[])[], limit = Infinity): number[][] | null {
  const { H, rank } = columnEchelon(A);
  const n = A.length;
  if (rank !== n) throw new RangeError('latticeClassRepresentatives: matrix is singular');
  const diag = H.map((row, i) => row[i]!);
  let count = 1;
  for (const h of diag) {
    if (!isSafe(h)) return null;
    count *= JSBI.toNumber(h);
    if (count > limit) return null;
  }
  const out: number[][] = [[]];
  let reps = out;
  for (let i = 0; i < n; i++) {
    const h = JSBI.toNumber(diag[i]!);
    const next: number[][] = [];
    for (const v of reps) for (let k = 0; k < h; k++) next.push([...v, k]);
    reps = next;
  }
  return reps;
}

/** Whether a rational matrix has only integral entries. */
export function isIntegralMatrix(A: RationalMatrix): boolean {
  return A.every((row) => row.every(rIsInteger));
}

/** 2M as an integral matrix, or a RangeError when 2M is not integral. */
export function twiceIntegral(M: RationalMatrix, what: string): Int[][] {
  const two = M.map((row) => row.map((x) => rmul(x, rat(2))));
  if (!isIntegralMatrix(two)) throw new RangeError(`${what}: 2M is not integral`);
  return two.map((row) => row.map((x) => x.num));
}

