/** Exact matrix utilities (src/types/matrix.ts). */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  ratMatrix,
  matrixRank,
  matrixInverse,
  determinant,
  isPositiveDefinite,
  isPositiveSemidefinite,
  isEvenGram,
  integralKernelSplit,
  congruence,
  matrixMultiply,
  identityMatrix,
  latticeClassRepresentatives,
  integralMultiple,
  matrixVector,
  type RationalMatrix,
} from '../../src/types/matrix.js';
import { rat, req, rcmp, rmul, rsub, rfloor, rational, type Rational } from '../../src/series/index.js';

const eqRat = (a: Rational, b: Rational): boolean => req(a, b);
const eqMatrix = (A: RationalMatrix, B: RationalMatrix): boolean =>
  A.length === B.length && A.every((row, i) => row.length === B[i]!.length && row.every((x, j) => eqRat(x, B[i]![j]!)));
const half = (A: RationalMatrix): Rational[][] => A.map((row) => row.map((x) => rmul(x, rat(1, 2))));

/** E8 Cartan matrix, nodes 1-3-4-5-6-7-8 in a chain and 2 attached to 4 (common practice, no source). */
const E8 = ratMatrix(
  (() => {
    const edges = [[1, 3], [3, 4], [4, 5], [5, 6], [6, 7], [7, 8], [2, 4]];
    const G = Array.from({ length: 8 }, (_, i) => Array.from({ length: 8 }, (_, j): number => (i === j ? 2 : 0)));
    for (const [a, b] of edges) G[a! - 1]![b! - 1] = G[b! - 1]![a! - 1] = -1;
    return G;
  })(),
);
/** D4: centre node 2 joined to 1, 3, 4 (common practice, no source). */
const D4 = ratMatrix([[2, -1, 0, 0], [-1, 2, -1, -1], [0, -1, 2, 0], [0, -1, 0, 2]]);
const A2 = ratMatrix([[2, -1], [-1, 2]]);

describe('matrix utilities on root lattices', () => {
  it('E8: det 1, even, positive definite (unimodular even lattice; common practice, no source)', () => {
    expect(eqRat(determinant(E8), rat(1))).toBe(true);
    expect(isEvenGram(E8)).toBe(true);
    expect(isPositiveDefinite(E8)).toBe(true);
    expect(matrixRank(E8)).toBe(8);
    const inv = matrixInverse(E8)!;
    expect(eqMatrix(matrixMultiply(E8, inv), identityMatrix(8))).toBe(true);
    // E8 unimodular: the inverse is integral (common practice, no source).
    expect(inv.every((row) => row.every((x) => x.den.toString() === '1'))).toBe(true);
  });
  it('D4 has det 4, A2 det 3 (|discriminant group| of the root lattices; common practice, no source)', () => {
    expect(eqRat(determinant(D4), rat(4))).toBe(true);
    expect(eqRat(determinant(A2), rat(3))).toBe(true);
    expect(isEvenGram(D4) && isEvenGram(A2)).toBe(true);
    expect(isPositiveDefinite(D4) && isPositiveDefinite(A2)).toBe(true);
    // A2⁻¹ = (1/3)[[2,1],[1,2]] (2×2 inverse by hand).
    expect(eqMatrix(matrixInverse(A2)!, ratMatrix([[[2, 3], [1, 3]], [[1, 3], [2, 3]]]))).toBe(true);
  });
  it('index matrices: A2/2 is not an even Gram matrix, but 2·(A2/2) is', () => {
    expect(isEvenGram(half(A2))).toBe(false);
    expect(isEvenGram(ratMatrix([[1, 0], [0, 1]]))).toBe(false); // odd diagonal
    expect(isEvenGram(ratMatrix([[2, 1], [0, 2]]))).toBe(false); // not symmetric
  });
});

describe('singular and indefinite matrices (by hand)', () => {
  const thetaSum = ratMatrix([[[1, 2], [1, 2]], [[1, 2], [1, 2]]]); // index of ϑ(z1 + z2)
  const hyperbolic = ratMatrix([[0, 1], [1, 0]]);
  const indefinite = ratMatrix([[1, 2], [2, 1]]);
  it('rank, det, inverse', () => {
    expect(matrixRank(thetaSum)).toBe(1);
    expect(eqRat(determinant(thetaSum), rat(0))).toBe(true);
    expect(matrixInverse(thetaSum)).toBeNull();
    expect(matrixRank(ratMatrix([[0, 0], [0, 0]]))).toBe(0);
    expect(matrixRank(ratMatrix([[1, 2, 3], [2, 4, 6]]))).toBe(1);
    expect(eqRat(determinant(hyperbolic), rat(-1))).toBe(true);
    expect(eqRat(determinant(indefinite), rat(-3))).toBe(true);
  });
  it('definiteness (principal minors by hand)', () => {
    expect(isPositiveDefinite(thetaSum)).toBe(false);
    expect(isPositiveSemidefinite(thetaSum)).toBe(true);
    expect(isPositiveSemidefinite(ratMatrix([[0, 0], [0, 0]]))).toBe(true);
    expect(isPositiveSemidefinite(hyperbolic)).toBe(false); // zero diagonal, non-zero row
    expect(isPositiveSemidefinite(indefinite)).toBe(false); // det < 0
    expect(isPositiveDefinite(ratMatrix([[-1]]))).toBe(false);
    expect(isPositiveSemidefinite(ratMatrix([[1, 1, 0], [1, 1, 0], [0, 0, -1]]))).toBe(false);
    expect(isPositiveSemidefinite(ratMatrix([[0, 0, 0], [0, 2, 1], [0, 1, 1]]))).toBe(true);
  });
  it('integralKernelSplit: ϑ(z1 + z2) has rank 1 with M′ = 1/2; an indefinite M throws', () => {
    const s = integralKernelSplit(thetaSum);
    expect(s.rank).toBe(1);
    expect(eqMatrix(s.reduced, ratMatrix([[[1, 2]]]))).toBe(true);
    expect(() => integralKernelSplit(indefinite)).toThrow(RangeError);
    expect(() => integralKernelSplit(hyperbolic)).toThrow(RangeError);
    const z = integralKernelSplit(ratMatrix([[0, 0], [0, 0]]));
    expect(z.rank).toBe(0);
    const dz = determinant(ratMatrix(z.U));
    expect(eqRat(dz, rat(1)) || eqRat(dz, rat(-1))).toBe(true);
    expect(z.reduced).toEqual([]);
  });
  it('integralKernelSplit saturates the kernel: M = ℓᵀℓ/2 with ℓ = (2, 4) has ker spanned by (2, −1), not (4, −2)', () => {
    const s = integralKernelSplit(ratMatrix([[2, 4], [4, 8]]));
    expect(s.rank).toBe(1);
    expect(Math.abs(s.U[0]![1]! * s.U[1]![1]!)).toBe(2); // kernel column ±(2, −1)
    expect(eqRat(determinant(ratMatrix(s.U)), rat(1)) || eqRat(determinant(ratMatrix(s.U)), rat(-1))).toBe(true);
  });
});

describe('integralKernelSplit property (fast-check, seeded)', () => {
  it('U unimodular, UᵀMU = diag(M′, 0) with M′ positive definite of size rank M, for M = AᵀA/2', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 4 }).chain((n) =>
          fc.integer({ min: 0, max: n + 1 }).chain((k) =>
            fc.array(fc.array(fc.integer({ min: -3, max: 3 }), { minLength: n, maxLength: n }), { minLength: k, maxLength: k }).map((A) => ({ n, A })),
          ),
        ),
        ({ n, A }) => {
          const M: Rational[][] = Array.from({ length: n }, (_, i) =>
            Array.from({ length: n }, (_, j) => rat(A.reduce((s, row) => s + row[i]! * row[j]!, 0), 2)),
          );
          const s = integralKernelSplit(M);
          const d = determinant(ratMatrix(s.U));
          expect(eqRat(d, rat(1)) || eqRat(d, rat(-1))).toBe(true);
          expect(s.rank).toBe(matrixRank(M));
          const full = congruence(M, s.U);
          const expected = Array.from({ length: n }, (_, i) =>
            Array.from({ length: n }, (_, j) => (i < s.rank && j < s.rank ? s.reduced[i]![j]! : rat(0))),
          );
          expect(eqMatrix(full, expected)).toBe(true);
          expect(isPositiveDefinite(s.reduced)).toBe(true);
        },
      ),
      { seed: 20240611, numRuns: 200 },
    );
  });
});

describe('lattice class representatives', () => {
  it('Z²/A2·Z² has 3 classes, Z⁴/D4·Z⁴ has 4, Z⁸/E8·Z⁸ one (|det|)', () => {
    expect(latticeClassRepresentatives(integralMultiple(A2))!.length).toBe(3);
    expect(latticeClassRepresentatives(integralMultiple(D4))!.length).toBe(4);
    expect(latticeClassRepresentatives(integralMultiple(E8))!.length).toBe(1);
    expect(latticeClassRepresentatives(integralMultiple(ratMatrix([[4, 2], [2, 4]])))!.length).toBe(12);
    expect(latticeClassRepresentatives(integralMultiple(ratMatrix([[4, 2], [2, 4]])), 5)).toBeNull();
  });
  it('the representatives are pairwise inequivalent (A⁻¹(v − w) not integral)', () => {
    const A = ratMatrix([[4, 2, 0], [2, 6, 1], [0, 1, 3]]);
    const reps = latticeClassRepresentatives(integralMultiple(A))!;
    expect(reps.length).toBe(Number(determinant(A).num.toString()));
    const inv = matrixInverse(A)!;
    const frac = (x: Rational): string => rsub(x, rational(rfloor(x))).num.toString() + '/' + rsub(x, rational(rfloor(x))).den.toString();
    const keys = new Set(reps.map((v) => matrixVector(inv, v.map((k) => rat(k))).map(frac).join(',')));
    expect(keys.size).toBe(reps.length);
    expect(rcmp(determinant(A), rat(0)) > 0).toBe(true);
  });
});
