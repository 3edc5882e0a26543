/** Theorem B and the choice between A and B (MATH.md §6). */
import { describe, expect, it } from 'vitest';
import { theoremBBound, theoremABound } from '../../src/bound/index.js';
import { ratMatrix } from '../../src/types/matrix.js';
import { rat, type Rational, rationalToString } from '../../src/series/index.js';

const show = (r: Rational): string => rationalToString(r);
const diag = (n: number, x: Rational): Rational[][] =>
  Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? x : rat(0))));

describe('theoremBBound', () => {
  it('n = 1, m = 1, 2, 3: Theorem A, with ρ = m/4 exactly (MATH.md §6: A needs less by m/12 − 1/24)', () => {
    for (const m of [1, 2, 3]) {
      for (const K of [rat(10), rat(-2), rat(12), rat(1, 2)]) {
        const r = theoremBBound(K, [[rat(m)]]);
        expect(r.theorem).toBe('A');
        expect(r.rank).toBe(1);
        expect(show(r.rho)).toBe(show(rat(m, 4)));
        expect(show(r.qOrder)).toBe(show(theoremABound(K, rat(m))));
      }
    }
  });
  it('n = 1, m = 1/2: A and B tie ((K+1)/12 = (K − ½)/12 + 1/8); A is reported', () => {
    const r = theoremBBound(rat(1, 2), [[rat(1, 2)]]);
    expect(r.theorem).toBe('A');
    expect(show(r.qOrder)).toBe('1/8');
    expect(show(r.rho)).toBe('1/8');
  });
  it('M = I/2 in 8 variables: ρ = 1, X = (K − 4)/12 + 1 (brief, by hand)', () => {
    const r = theoremBBound(rat(4), diag(8, rat(1, 2)));
    expect(r.theorem).toBe('B');
    expect(r.rank).toBe(8);
    expect(show(r.rho)).toBe('1');
    expect(show(r.qOrder)).toBe('1'); // (4 − 4)/12 + 1
  });
  it('`Delta == 0` in two variables: M = 0, K = 12, X = 1 so q¹ is compared (MATH.md §6, never a pseudo-inverse)', () => {
    const r = theoremBBound(rat(12), diag(2, rat(0)));
    expect(r.theorem).toBe('A');
    expect(r.rank).toBe(0);
    expect(show(r.qOrder)).toBe('1');
    expect(show(r.rho)).toBe('0');
  });
  it('ϑ(z1 + z2): M = [[1/2,1/2],[1/2,1/2]] splits to rank 1, m = 1/2; X = (1/2 + 1)/12 = 1/8 reaches ϑ\'s first term q^{1/8} (MATH.md §2)', () => {
    const r = theoremBBound(rat(1, 2), ratMatrix([[[1, 2], [1, 2]], [[1, 2], [1, 2]]]));
    expect(r.rank).toBe(1);
    expect(r.theorem).toBe('A');
    expect(show(r.qOrder)).toBe('1/8');
    expect(r.derivation).toContain('ker M of dimension 1');
  });
  it('E8/2: ρ = 0 (one class, ℓ = 0), X = (K − 4)/12 (common practice, no source)', () => {
    const edges = [[1, 3], [3, 4], [4, 5], [5, 6], [6, 7], [7, 8], [2, 4]];
    const M = diag(8, rat(1));
    for (const [a, b] of edges) M[a! - 1]![b! - 1] = M[b! - 1]![a! - 1] = rat(-1, 2);
    const r = theoremBBound(rat(4), M);
    expect(show(r.rho)).toBe('0');
    expect(show(r.qOrder)).toBe('0');
    expect(r.theorem).toBe('B');
  });
  it('A2/2: ρ = 1/3, X = (K − 1)/12 + 1/3 (brute force in test/types/holomorphy-matrix.test.ts)', () => {
    const r = theoremBBound(rat(2), ratMatrix([[1, [-1, 2]], [[-1, 2], 1]]));
    expect(show(r.rho)).toBe('1/3');
    expect(show(r.qOrder)).toBe('5/12');
    expect(r.rank).toBe(2);
  });
  it('a kernel inside more variables keeps n = rank: diag(1, 0, 0) is the one-variable index 1', () => {
    const M = ratMatrix([[1, 0, 0], [0, 0, 0], [0, 0, 0]]);
    const r = theoremBBound(rat(10), M);
    expect(r.rank).toBe(1);
    expect(show(r.qOrder)).toBe(show(theoremABound(rat(10), rat(1))));
  });
  it('indefinite or non-half-integral index is refused (caller reports unsupported)', () => {
    expect(() => theoremBBound(rat(2), ratMatrix([[0, [1, 2]], [[1, 2], 0]]))).toThrow(RangeError);
    expect(() => theoremBBound(rat(2), ratMatrix([[[1, 3]]]))).toThrow(RangeError);
  });
});
