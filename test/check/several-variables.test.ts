/**
 * Jacobi forms in several variables (MATH.md §2, §3, §6 Theorem B): theta products,
 * pullbacks, lattice theta series, types with index matrices, sharpness, mutants.
 */
import { describe, expect, it } from 'vitest';
import { parseExpression } from '../../src/lang/index.js';
import { newEvalContext, evaluate, expandMonomial } from '../../src/check/index.js';
import { monomialType } from '../../src/check/monomial-parts.js';
import { rat, rsub, rmul, coefficientAt, rationalToString, forEachTerm, sliceExponent, rational, type QZSeries, type Rational } from '../../src/series/index.js';
import { formatType, heisenbergCharacter, type ModularType } from '../../src/types/index.js';
import { checkText } from '../helpers/check.js';
import { latticeThetaSeries } from '../../src/forms/lattice-theta.js';
import { substituteLinear } from '../../src/series/index.js';
import { readOeis } from '../helpers/oeis.js';
import { cli } from '../helpers/cli.js';

const V8 = ['z1', 'z2', 'z3', 'z4', 'z5', 'z6', 'z7', 'z8'];
const P8 = V8.map((v) => `theta(${v})`).join('*');
const E8 = `lattice E8 = [[2, 0, -1, 0, 0, 0, 0, 0], [0, 2, 0, -1, 0, 0, 0, 0], [-1, 0, 2, -1, 0, 0, 0, 0], [0, -1, -1, 2, -1, 0, 0, 0], [0, 0, 0, -1, 2, -1, 0, 0], [0, 0, 0, 0, -1, 2, -1, 0], [0, 0, 0, 0, 0, -1, 2, -1], [0, 0, 0, 0, 0, 0, -1, 2]]`;

function expandIn(variables: string[], text: string, to: number): { series: QZSeries; type: ModularType | null } {
  const p = parseExpression(text, variables);
  expect(p.diagnostics).toEqual([]);
  const m = evaluate(p.expr!, newEvalContext(text, variables));
  return { series: expandMonomial(m, variables.length, rat(to), 1e8, null).series, type: monomialType(m, variables.length) };
}

function verdicts(text: string): [string, string][] {
  return checkText(text).map((v) => [v.name, v.verdict]);
}

describe('the eightfold theta product', () => {
  it('has weight 4, index I/2 and the Heisenberg character (1, …, 1) (common practice, no source)', () => {
    const { type } = expandIn(V8, P8, 1);
    expect(formatType(type!)).toBe(
      `jacobi(weight 4, index [${V8.map((_, i) => `[${V8.map((__, j) => (i === j ? '1/2' : '0')).join(', ')}]`).join(', ')}])`,
    );
    expect(heisenbergCharacter(type!)).toEqual([1, 1, 1, 1, 1, 1, 1, 1]);
  });

  it('its coefficients are invariant under shifts by D8 and change sign under odd shifts (MATH.md §6, index I/2)', () => {
    // c(x + λ·ℓ + |λ|²/2, ℓ + λ) = (−1)^{Σλ} c(x, ℓ) for λ ∈ Z⁸ (elliptic law with M = I/2, 2Mλ = λ);
    // the sign is +1 exactly on D8 = {λ : Σλ even}.
    const { series } = expandIn(V8, P8, 4);
    const shifts = [
      [1, 1, 0, 0, 0, 0, 0, 0],
      [1, -1, 0, 0, 0, 0, 0, 0],
      [0, 0, 1, 0, 0, 0, 1, 0],
      [1, 0, 0, 0, 0, 0, 0, 0],
      [0, 0, 0, 0, 0, 0, 0, -1],
    ];
    // every coefficient by (q-exponent, ζ-exponents), for constant-time lookups (zero when absent)
    const table = new Map<string, string>();
    series.slices.forEach((sl, i) => {
      const x = rationalToString(sliceExponent(series, i));
      forEachTerm(sl, (h, v) => table.set(`${x}|${h.join(',')}`, rationalToString(rational(v, series.den))));
    });
    const at = (x: Rational, h: readonly number[]): string => table.get(`${rationalToString(x)}|${h.join(',')}`) ?? '0';
    let checked = 0;
    series.slices.forEach((sl, i) => {
      const x = sliceExponent(series, i);
      forEachTerm(sl, (h, v) => {
        for (const lam of shifts) {
          const l = h.map((e) => e / 2);
          const dot = l.reduce((s, li, k) => s + li * lam[k]!, 0);
          const sq = lam.reduce((s, t) => s + t * t, 0);
          const x2 = rat(Number(x.num.toString()) * 2 + (dot * 2 + sq) * Number(x.den.toString()), 2 * Number(x.den.toString()));
          if (rsub(rat(4), x2).num.toString().startsWith('-')) continue;
          const shifted = at(x2, h.map((e, k) => e + 2 * lam[k]!));
          const sign = lam.reduce((s, t) => s + t, 0) % 2 === 0 ? 1 : -1;
          expect(shifted).toBe(rationalToString(rmul(rat(sign), rational(v, series.den))));
          checked++;
        }
      });
    });
    expect(checked).toBeGreaterThan(1000);
  });

  it('in coordinates of a D8 basis it has lattice index D8, and == 0 is refuted exactly at the Theorem B bound q¹', () => {
    const vs = checkText(
      `variables w1, w2, w3, w4, w5, w6, w7, w8
lattice D8 = [[2, -1, 0, 0, 0, 0, 0, 0], [-1, 2, -1, 0, 0, 0, 0, 0], [0, -1, 2, -1, 0, 0, 0, 0], [0, 0, -1, 2, -1, 0, 0, 0], [0, 0, 0, -1, 2, -1, 0, 0], [0, 0, 0, 0, -1, 2, -1, -1], [0, 0, 0, 0, 0, -1, 2, 0], [0, 0, 0, 0, 0, -1, 0, 2]]
let P(z1, z2, z3, z4, z5, z6, z7, z8) = ${P8}
claim "D8": P(w1, w2 - w1, w3 - w2, w4 - w3, w5 - w4, w6 - w5, w7 + w8 - w6, w8 - w7) is jacobi(weight 4, lattice D8)
claim "zero": P(w1, w2, w3, w4, w5, w6, w7, w8) == 0
`,
    );
    expect(vs.map((v) => [v.name, v.verdict])).toEqual([
      ['D8', 'proved'],
      ['zero', 'refuted'],
    ]);
    // Theorem B: X = (K − n/2)/12 + ρ = (4 − 4)/12 + 1 = 1, and the product starts at q^{8/8} = q¹
    expect(vs[1]!.mismatch?.q).toBe('1');
  });
});

describe('Theorem B sharpness and the margin', () => {
  it('Δ·Θ_E8 == 0 is refuted at q¹ = its bound (K − n/2)/12 + ρ = (16 − 4)/12 + 0', () => {
    const v = checkText(`variables ${V8.join(', ')}\n${E8}\nclaim: Delta * Theta[E8](${V8.join(', ')}) == 0\n`)[0]!;
    expect(v.verdict).toBe('refuted');
    expect(v.mismatch?.q).toBe('1');
  });
  it('with a wrong type rule (weight lowered by 12) the margin turns it into an internal error', () => {
    const lower = (t: ModularType): ModularType => ({ ...t, weight: rsub(t.weight, rat(12)) });
    const v = checkText(`variables ${V8.join(', ')}\n${E8}\nclaim: Delta * Theta[E8](${V8.join(', ')}) == 0\n`, { adjustTypeForTest: lower })[0]!;
    expect(v.verdict).toBe('error');
    expect(v.reason).toMatch(/^internal error/);
  });
  it('a singular index splits off its kernel: Delta == 0 in two variables still compares q¹ (MATH.md §6)', () => {
    const v = checkText('variables z1, z2\nclaim: Delta == 0\n')[0]!;
    expect(v.verdict).toBe('refuted');
    expect(v.mismatch).toEqual({ q: '1', zeta: ['0', '0'], left: '1', right: '0' });
  });
  it('φ_{10,1}(z1)φ_{10,1}(z2) == 0 is refuted; index diag(1,1), ρ = 1/2, X = (20 − 1)/12 + 1/2', () => {
    const v = checkText('variables z1, z2\nclaim: phi_{10,1}(z1)*phi_{10,1}(z2) == 0\n')[0]!;
    expect(v.verdict).toBe('refuted');
    expect(v.mismatch?.q).toBe('2'); // φ_{10,1} starts at q¹ in each variable
  });
});

describe('the E8 lattice theta series', () => {
  it('Θ_E8(0) = E_4 (OEIS A004009) and a pullback along a root is E_{4,1} (Eichler–Zagier 1985, §7)', () => {
    const vs = checkText(
      `variables ${V8.join(', ')}\n${E8}\nclaim "E_4": Theta[E8](0) == E_4\nclaim "E41": Theta[E8](z1, 0, 0, 0, 0, 0, 0, 0) == E_{4,1}(z1)\nclaim "not E41" : Theta[E8](z1, z1, 0, 0, 0, 0, 0, 0) == E_{4,1}(z1)\n`,
    );
    expect(vs.map((v) => [v.name, v.verdict])).toEqual([
      ['E_4', 'proved'],
      ['E41', 'proved'],
      ['not E41', 'refuted'], // e1 + e2 is not a root of this basis: (e1+e2)ᵀG(e1+e2) = 4, index 2
    ]);
  });
  it('Θ_E8 restricted to w = 0 counts the lattice vectors by norm: OEIS A004009 to q⁴', () => {
    const G = [
      [2, 0, -1, 0, 0, 0, 0, 0],
      [0, 2, 0, -1, 0, 0, 0, 0],
      [-1, 0, 2, -1, 0, 0, 0, 0],
      [0, -1, -1, 2, -1, 0, 0, 0],
      [0, 0, 0, -1, 2, -1, 0, 0],
      [0, 0, 0, 0, -1, 2, -1, 0],
      [0, 0, 0, 0, 0, -1, 2, -1],
      [0, 0, 0, 0, 0, 0, -1, 2],
    ];
    const restricted = substituteLinear(latticeThetaSeries(G, rat(4)), G.map(() => [0]));
    const seq = readOeis('A004009'); // OEIS A004009: theta series of the E8 lattice
    expect([0, 1, 2, 3, 4].map((n) => rationalToString(coefficientAt(restricted, rat(n), 0)))).toEqual(seq.terms.slice(0, 5));
  });
  it('a lattice that is not unimodular gives unproved, stating its level', () => {
    const v = checkText('variables z1, z2\nlattice A2 = [[2, -1], [-1, 2]]\nclaim: Theta[A2](z1, z2) == Theta[A2](z2, z1)\n')[0]!;
    expect(v.verdict).toBe('unproved');
    expect(v.reason).toMatch(/level 3/);
  });
  it.each([
    ['[[2, 1], [1, 1]]', 'even'],
    ['[[2, 3], [3, 2]]', 'positive definite'],
    ['[[2, 1], [0, 2]]', 'symmetric'],
  ])('lattice %s is rejected: not %s', (gram, reason) => {
    const vs = checkText(`variables z1, z2\nlattice L = ${gram}\n`);
    expect(vs[0]!.verdict).toBe('error');
    expect(vs[0]!.reason).toContain(reason);
  });
});

describe('theta products in two variables', () => {
  const T = 'let T(u, v) = theta(u) * theta(v) * theta(u + v) / eta\n';
  it('ϑ(z1)ϑ(z2)ϑ(z1+z2)/η has weight 1 and a character of order 3; its diagonal pullback is ϑ(z)²ϑ(2z)/η', () => {
    const { type } = expandIn(['z1', 'z2'], 'theta(z1)*theta(z2)*theta(z1+z2)/eta', 1);
    expect(formatType(type!)).toBe('jacobi(weight 1, index [[1, 1/2], [1/2, 1]], character eta^8)'); // v_η^8 has order 3
    expect(verdicts(`variables z1, z2\n${T}claim "pullback": T(z1, z1) == theta(z1)^2*theta(2z1)/eta\n`)).toEqual([['pullback', 'proved']]);
    expect(verdicts(`${T}claim "one variable": T(z, z) == theta(z)^2*theta(2z)/eta\n`)).toEqual([['one variable', 'proved']]);
  });
  it('mutants are refuted', () => {
    const vs = checkText(
      `variables z1, z2\n${T}claim "a": T(z1, z1) == 2*theta(z1)^2*theta(2z1)/eta\nclaim "b": T(z1, z2) == T(z1, -z2)\nclaim "c": T(z1, z1) == theta(z1)^2*theta(2z1)/eta^2\n`,
    );
    expect(vs.map((v) => v.verdict)).toEqual(['refuted', 'refuted', 'refuted']);
  });
  it('the divisor rule works by primitive direction (MATH.md §3)', () => {
    const vs = checkText(
      'variables z1, z2\nclaim "block": theta(2z1 + 2z2)/theta(z1 + z2) is jacobi(weight 0, index [[3/2, 3/2], [3/2, 3/2]])\nclaim "pole": theta(z1 + z2)/(theta(z1)*theta(z2)) is jacobi(weight -1/2, index [[-1/2, 1/2], [1/2, -1/2]], character eta^21)\n',
    );
    expect(vs.map((v) => [v.name, v.verdict])).toEqual([
      ['block', 'proved'],
      ['pole', 'refuted'],
    ]);
  });
  it('expand in two variables lists vector exponents, ordered by ℓᵀM⁻¹ℓ (CLAIMS.md)', async () => {
    const r = await cli('expand', '--variables', 'z1,z2', 'theta(z1)*theta(z2)', '--to', '1/4', '--format', 'json');
    const out = JSON.parse(r.stdout) as { type: { index: string[][] }; terms: { q: string; zeta: string[]; c: string }[] };
    expect(out.type.index).toEqual([
      ['1/2', '0'],
      ['0', '1/2'],
    ]);
    // ϑ(z1)ϑ(z2) = q^{1/4}(ζ1^{1/2} − ζ1^{−1/2})(ζ2^{1/2} − ζ2^{−1/2}) + …; all four have ℓᵀM⁻¹ℓ = 1: lexicographic
    expect(out.terms).toEqual([
      { q: '1/4', zeta: ['-1/2', '-1/2'], c: '1' },
      { q: '1/4', zeta: ['-1/2', '1/2'], c: '-1' },
      { q: '1/4', zeta: ['1/2', '-1/2'], c: '-1' },
      { q: '1/4', zeta: ['1/2', '1/2'], c: '1' },
    ]);
  });
});

describe('operators in several variables', () => {
  it('the heat operator with an index matrix (MATH.md §5): theta products are killed, products follow the Leibniz rule', () => {
    // each ϑ(z_i) satisfies D_qϑ = ½D_ζ²ϑ (MATH.md §5 check), and (2k − n)/24 = 0 for ϑ(z1)ϑ(z2)
    const vs = checkText(
      'variables z1, z2\nclaim "theta": heat(theta(z1)*theta(z2)) == 0\nclaim "leibniz": heat(phi_{-2,1}(z1)*phi_{-2,1}(z2)) == -(phi_{0,1}(z1)*phi_{-2,1}(z2) + phi_{-2,1}(z1)*phi_{0,1}(z2))/24\nclaim "wrong": heat(phi_{-2,1}(z1)*phi_{-2,1}(z2)) == -(phi_{0,1}(z1)*phi_{-2,1}(z2) + phi_{-2,1}(z1)*phi_{0,1}(z2))/12\nclaim "singular": heat(theta(z1 + z2)) == 0\n',
    );
    expect(vs.map((v) => [v.name, v.verdict])).toEqual([
      ['theta', 'proved'],
      ['leibniz', 'proved'], // Hφ_{−2,1} = −φ_{0,1}/24 in each variable (test/check/operators.test.ts)
      ['wrong', 'refuted'],
      ['singular', 'error'], // the heat operator needs an invertible index
    ]);
  });
  it('the Serre derivative of an index-0 form in a two-variable file', () => {
    const v = checkText('variables z1, z2\nclaim: serre(E_4) == -E_6/3\n')[0]!; // Ramanujan 1916
    expect(v.verdict).toBe('proved');
  });
});

