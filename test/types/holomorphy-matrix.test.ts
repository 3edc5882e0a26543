/** ρ, class representatives and holomorphy at the cusp in several variables (MATH.md §6). */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  indexRho,
  indexClassRepresentatives,
  cosetMinimum,
  closestVectorDistance,
  holomorphyOrderMatrix,
  mustVanishVector,
  quarterNorm,
  heisenbergVector,
} from '../../src/types/holomorphy-matrix.js';
import { mustVanish, holomorphyOrder } from '../../src/types/holomorphy.js';
import { ratMatrix, matrixInverse, determinant, type RationalMatrix } from '../../src/types/matrix.js';
import { rat, req, rcmp, radd, rsub, rmul, rfloor, rational, type Rational } from '../../src/series/index.js';

const show = (r: Rational): string => `${r.num.toString()}/${r.den.toString()}`;
const half = (G: readonly (readonly number[])[]): Rational[][] => G.map((row) => row.map((x) => rat(x, 2)));

/**
 * Independent brute force: enumerate ℓ ∈ c/2 + Zⁿ in a box, key each by the class of
 * (2M)⁻¹(ℓ − c/2) mod Zⁿ (exact fractional parts), keep the least ¼ℓᵀM⁻¹ℓ per key.
 * Returns the max over keys and the number of keys seen.
 */
function bruteRho(M: RationalMatrix, box: number): { rho: Rational; classes: number } {
  const n = M.length;
  const c = M.map((row, i) => {
    const t = rmul(row[i]!, rat(2));
    return t.den.toString() === '1' && Number(t.num.toString()) % 2 === 0 ? 0 : 1;
  });
  const Minv = matrixInverse(M)!;
  const twoInv = matrixInverse(M.map((row) => row.map((x) => rmul(x, rat(2)))))!;
  const best = new Map<string, Rational>();
  const l: number[] = Array.from({ length: n }, () => -box);
  for (;;) {
    const lv = l.map((k, i) => radd(rat(k), rat(c[i]!, 2)));
    const key = twoInv
      .map((row) => {
        let s = rat(0);
        row.forEach((a, j) => (s = radd(s, rmul(a, rat(l[j]!)))));
        const f = rsub(s, rational(rfloor(s)));
        return show(f);
      })
      .join(',');
    const v = quarterNorm(lv, Minv);
    const old = best.get(key);
    if (old === undefined || rcmp(v, old) < 0) best.set(key, v);
    let i = 0;
    while (i < n && l[i] === box) l[i++] = -box;
    if (i === n) break;
    l[i]!++;
  }
  let rho = rat(0);
  for (const v of best.values()) if (rcmp(v, rho) > 0) rho = v;
  return { rho, classes: best.size };
}

describe('ρ = max_γ min_{ℓ∈γ} ¼ℓᵀM⁻¹ℓ', () => {
  it('one variable, integral m = 1, 2, 3: ρ = m/4 (classes r mod 2m, least r²/4m, worst r = m; MATH.md §6)', () => {
    for (const m of [1, 2, 3]) {
      const r = indexRho([[rat(m)]]);
      expect(show(r.rho)).toBe(show(rat(m, 4)));
      expect(r.classes).toBe(2 * m);
      expect(r.exact).toBe(true);
    }
    // half-integral m = 1/2, 3/2: classes r ∈ ½ + Z mod 2m, again m/4 (MATH.md §6).
    expect(show(indexRho([[rat(1, 2)]]).rho)).toBe('1/8');
    expect(show(indexRho([[rat(3, 2)]]).rho)).toBe('3/8');
  });
  it('M = I/2 in 8 variables: one class ℓ ∈ (½ + Z)⁸, ρ = 8·¼·2·¼ = 1 (brief, by hand)', () => {
    const M = Array.from({ length: 8 }, (_, i) => Array.from({ length: 8 }, (_, j) => rat(i === j ? 1 : 0, 2)));
    expect(heisenbergVector(M)).toEqual([1, 1, 1, 1, 1, 1, 1, 1]);
    const r = indexRho(M);
    expect(r.classes).toBe(1);
    expect(show(r.rho)).toBe('1/1');
  });
  it('E8/2: unimodular, one class ℓ = 0, ρ = 0 (common practice, no source)', () => {
    const edges = [[1, 3], [3, 4], [4, 5], [5, 6], [6, 7], [7, 8], [2, 4]];
    const G = Array.from({ length: 8 }, (_, i) => Array.from({ length: 8 }, (_, j): number => (i === j ? 2 : 0)));
    for (const [a, b] of edges) G[a! - 1]![b! - 1] = G[b! - 1]![a! - 1] = -1;
    const r = indexRho(half(G));
    expect(r.classes).toBe(1);
    expect(show(r.rho)).toBe('0/1');
  });
  it('A2/2: 3 classes, non-trivial ones at 1/3, ρ = 1/3 (brute force in this test)', () => {
    const M = half([[2, -1], [-1, 2]]);
    const r = indexRho(M);
    expect(r.classes).toBe(3);
    expect(show(r.rho)).toBe('1/3');
    const values = indexClassRepresentatives(M)!.map((w) => show(cosetMinimum(M, w).value)).sort();
    expect(values).toEqual(['0/1', '1/3', '1/3']);
    const b = bruteRho(M, 6);
    expect(b.classes).toBe(3);
    expect(show(b.rho)).toBe('1/3');
  });
  it('D4/2: 4 classes, ρ = 1/2 (the three non-trivial classes have minimal norm 1 in D4*, ¼·2·1; brute force)', () => {
    const M = half([[2, -1, 0, 0], [-1, 2, -1, -1], [0, -1, 2, 0], [0, -1, 0, 2]]);
    const r = indexRho(M);
    expect(r.classes).toBe(4);
    expect(show(r.rho)).toBe(show(bruteRho(M, 3).rho));
    expect(show(r.rho)).toBe('1/2');
  });
  it('brute force on random small positive definite M = (AᵀA + D)/2 never exceeds the computed ρ (fast-check, seeded)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 3 }).chain((n) =>
          fc.record({
            A: fc.array(fc.array(fc.integer({ min: -2, max: 2 }), { minLength: n, maxLength: n }), { minLength: n, maxLength: n }),
            D: fc.array(fc.integer({ min: 1, max: 3 }), { minLength: n, maxLength: n }),
          }),
        ),
        ({ A, D }) => {
          const n = D.length;
          const G = Array.from({ length: n }, (_, i) =>
            Array.from({ length: n }, (_, j) => A.reduce((s, row) => s + row[i]! * row[j]!, 0) + (i === j ? D[i]! : 0)),
          );
          const M = half(G);
          const r = indexRho(M);
          const trace = G.reduce((s, row, i) => s + row[i]!, 0) / 2;
          const maxDiag = Math.max(...G.map((row, i) => row[i]!)) / 2;
          // ρ ≤ ¼ tr M (LDLᵀ pivots are ≤ the diagonal) and ℓᵢ² ≤ 4ρ·M_ii for a minimiser.
          const box = Math.ceil(Math.sqrt(trace * maxDiag)) + 1;
          const b = bruteRho(M, box);
          expect(b.classes).toBe(Number(determinant(G.map((row) => row.map((x) => rat(x)))).num.toString()));
          expect(r.classes).toBe(b.classes);
          expect(rcmp(b.rho, r.rho) <= 0).toBe(true);
          expect(show(b.rho)).toBe(show(r.rho));
        },
      ),
      { seed: 7, numRuns: 30 },
    );
  });
  it('closest vector: exact minimum and minimiser on a skew form', () => {
    const A = ratMatrix([[5, 4], [4, 5]]);
    const t = [rat(1, 3), rat(-1, 3)];
    const { value, y } = closestVectorDistance(A, t);
    // candidates by hand: y = (0,0): (1/9)(5 − 8 + 5) = 2/9 — the minimum over a 5×5 box (checked below)
    let best: Rational | undefined;
    for (let a = -2; a <= 2; a++)
      for (let b = -2; b <= 2; b++) {
        const u = [rsub(rat(a), t[0]!), rsub(rat(b), t[1]!)];
        const v = radd(radd(rmul(rat(5), rmul(u[0]!, u[0]!)), rmul(rat(8), rmul(u[0]!, u[1]!))), rmul(rat(5), rmul(u[1]!, u[1]!)));
        if (best === undefined || rcmp(v, best) < 0) best = v;
      }
    expect(req(value, best!)).toBe(true);
    expect(show(value)).toBe('2/9');
    expect(y.map((k) => k.toString())).toEqual(['0', '0']);
  });
  it('a nearest-plane upper bound above the class limit is ≥ the exact ρ', () => {
    const M = half([[6, 1, 0], [1, 6, 1], [0, 1, 6]]);
    const exact = indexRho(M);
    const bound = indexRho(M, 10);
    expect(exact.exact).toBe(true);
    expect(bound.exact).toBe(false);
    expect(rcmp(bound.rho, exact.rho) >= 0).toBe(true);
  });
});

describe('holomorphy at the cusp, several variables', () => {
  it('agrees with the one-variable rule (MATH.md §6) for M = [[m]]', () => {
    for (const m of [rat(1, 2), rat(1), rat(3, 2), rat(2), rat(5)]) {
      const Minv = matrixInverse([[m]])!;
      for (const p of ['weak', 'holomorphic', 'cusp'] as const) {
        expect(show(holomorphyOrderMatrix(p, [[m]]))).toBe(show(holomorphyOrder(p, m)));
        for (let x8 = -8; x8 <= 16; x8++)
          for (let r2 = -8; r2 <= 8; r2++) {
            const x = rat(x8, 8);
            const r = rat(r2, 2);
            expect(mustVanishVector(p, x, [r], Minv)).toBe(mustVanish(p, x, r, m));
          }
      }
    }
  });
  it('ϑ(z1)ϑ(z2)ϑ(z1+z2)/η, index [[1,1/2],[1/2,1]]: its q^{1/3} term ζ1ζ2 has norm 1/3 − 1/3 = 0 (hand expansion of the product): holomorphic allows it, cusp does not', () => {
    const M = ratMatrix([[1, [1, 2]], [[1, 2], 1]]);
    const Minv = matrixInverse(M)!;
    expect(show(holomorphyOrderMatrix('holomorphic', M))).toBe('1/3');
    expect(mustVanishVector('holomorphic', rat(1, 3), [rat(1), rat(1)], Minv)).toBe(false);
    expect(mustVanishVector('cusp', rat(1, 3), [rat(1), rat(1)], Minv)).toBe(true);
    expect(mustVanishVector('weak', rat(-1, 3), [rat(0), rat(0)], Minv)).toBe(true);
  });
  it('singular or indefinite M is refused', () => {
    expect(() => holomorphyOrderMatrix('holomorphic', ratMatrix([[[1, 2], [1, 2]], [[1, 2], [1, 2]]]))).toThrow(RangeError);
    expect(() => holomorphyOrderMatrix('weak', ratMatrix([[1, 2], [2, 1]]))).toThrow(RangeError);
    expect(() => indexRho(ratMatrix([[[1, 3]]]))).toThrow(RangeError); // 2M not integral
  });
});
