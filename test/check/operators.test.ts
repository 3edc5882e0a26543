/**
 * Operators as first-class parts of the language (MATH.md §5, §7): Hecke eigenforms,
 * Ramanujan's differential equations, Rankin–Cohen, Taylor coefficients, the heat
 * operator; their mutants; invariance of Hecke images; preconditions; quasi inputs.
 */
import { describe, expect, it } from 'vitest';
import { parseExpression } from '../../src/lang/index.js';
import { newEvalContext, evaluate, expandMonomial } from '../../src/check/index.js';
import { type QZSeries, rat, coefficientAt, rationalToString, sliceExponent, rational, mod, dense } from '../../src/series/index.js';
import { checkOne, checkText } from '../helpers/check.js';

function expand(text: string, to: number): QZSeries {
  const p = parseExpression(text, ['z']);
  expect(p.diagnostics).toEqual([]);
  return expandMonomial(evaluate(p.expr!, newEvalContext(text, ['z'])), 1, rat(to), 1e8, null).series;
}

/** The p-th coefficient of a q-series (Hecke eigenvalue of a normalised eigenform). */
function lambda(form: string, p: number): string {
  return rationalToString(coefficientAt(expand(form, p), rat(p), 0));
}

describe('Hecke eigenforms: J_{k,1} ≅ M_{2k−2} (Eichler–Zagier 1985, §4–5, Thm 4.5 and §6)', () => {
  it.each([
    ['phi_{10,1}', 'Delta*E_6', 2], // S_18 = C·ΔE_6
    ['phi_{10,1}', 'Delta*E_6', 3],
    ['phi_{10,1}', 'Delta*E_6', 5],
    ['phi_{12,1}', 'Delta*E_{10}', 2], // S_22 = C·ΔE_10
    ['phi_{12,1}', 'Delta*E_{10}', 3],
  ])('T_p %s = λ_p %s with λ_p the p-th coefficient of %s', (phi, eigenform, p) => {
    const l = lambda(eigenform, p);
    if (p === 2 && phi === 'phi_{10,1}') expect(l).toBe('-528'); // MATH.md §7: ΔE_6 = q − 528q² + …
    expect(checkOne(`T_${p}(${phi}) == ${l}*${phi}`).verdict).toBe('proved');
    expect(checkOne(`T_${p}(${phi}) == ${Number(l) + 1}*${phi}`).verdict).toBe('refuted'); // mutant: wrong eigenvalue
  });

  it('T_p of a weak form may have a q⁻¹ term (MATH.md §7)', () => {
    const s = expand('T_2(phi_{0,1})', 0);
    expect(rationalToString(s.start)).toBe('-1');
    expect(rationalToString(coefficientAt(s, rat(-1), 0))).not.toBe('0');
  });
});

describe('invariance: Hecke images depend only on (4nm − r², r mod 2m) (Eichler–Zagier 1985, Thm 2.2)', () => {
  it.each([
    ['V_2(phi_{10,1})', 2, 6],
    ['V_3(phi_{0,1})', 3, 4],
    ['V_2(E_{4,1})', 2, 6],
    ['T_2(phi_{0,1})', 1, 5],
    ['T_3(E_{6,1})', 1, 4],
    ['V_2(U_2(phi_{-2,1}))', 8, 8],
  ])('%s (index %i) to q^%i', (expr, m, to) => {
    const s = expand(expr, to);
    const seen = new Map<string, string>();
    let checked = 0;
    s.slices.forEach((slice, i) => {
      const sl = dense(slice);
      const x = sliceExponent(s, i);
      for (let e = sl.lo; e < sl.lo + sl.c.length; e++) {
        const r = e / 2;
        const n = Number(x.num.toString()) / Number(x.den.toString());
        const key = `${4 * n * m - r * r}|${mod(r, 2 * m)}`;
        const v = rationalToString(rational(sl.c[e - sl.lo]!, s.den));
        const prev = seen.get(key);
        // a class first seen at the edge of a slice may be cut off elsewhere by the q-order; compare where both are known
        if (prev !== undefined) {
          expect(v, `${expr} at q^${n} ζ^${r}`).toBe(prev);
          checked++;
        } else seen.set(key, v);
      }
    });
    expect(checked).toBeGreaterThan(10);
  });
});

describe("Ramanujan's differential equations and Rankin–Cohen (MATH.md §5)", () => {
  it.each([
    ['serre(E_4) == -E_6/3', 'Ramanujan 1916: D_qE_4 = (E_2E_4 − E_6)/3'],
    ['serre(E_6) == -E_4^2/2', 'Ramanujan 1916: D_qE_6 = (E_2E_6 − E_4²)/2'],
    ['[E_4, E_6]_1 == -3456*Delta', 'Zagier 1994; MATH.md §5'],
    ['serre(Delta) == 0', 'Δ′ = E_2Δ (Jacobi product formula), so ∂_12 Δ = 0'],
  ])('%s  (%s)', (claim) => {
    expect(checkOne(claim).verdict).toBe('proved');
  });
  it.each(['serre(E_4) == -E_6/2', 'serre(E_6) == -E_4^2/3', '[E_4, E_6]_1 == 3456*Delta', '[E_4, E_6]_2 == -3456*Delta'])('mutant %s is refuted', (claim) => {
    expect(['refuted', 'error']).toContain(checkOne(claim).verdict);
  });
  it('serre(E_2) has no type: never −E_4/6 (MATH.md §5)', () => {
    const v = checkOne('serre(E_2) == -(E_2^2 + E_4)/12'); // ∂_2E_2 = D_qE_2 − E_2²/6 = −(E_2² + E_4)/12 by Ramanujan
    expect(v.verdict).toBe('unproved');
    expect(v.reason).toMatch(/serre of a quasi-modular input has no proven type/);
    expect(checkOne('serre(E_2) == -E_4/6').verdict).toBe('refuted');
  });
  it('bare Dq stays quasi inside operators', () => {
    const v = checkOne('serre(Dq(E_4) - E_2*E_4/3) == -serre(E_6)/3');
    expect(v.verdict).toBe('unproved');
  });
});

describe('modified Taylor coefficients (MATH.md §5)', () => {
  it.each([
    ['taylor(theta(z), 1) == eta^3', "Jacobi's derivative formula"],
    ['taylor(phi_{10,1}, 2) == Delta', 'MATH.md §5 check'],
    ['taylor(E_{4,1}, 0) == E_4', 'MATH.md §5 check; Eichler–Zagier Thm 2.1'],
    ['taylor(phi_{0,1}, 0) == 12', 'φ_{0,1}(τ, 0) = 12 (MATH.md §2: q⁰ slice ζ + 10 + ζ⁻¹ sums to 12)'],
    ['taylor(phi_{-2,1}, 2) == 1', 'φ_{−2,1} = (2πiz)²·(1 + …), g_2 = 1 (Eichler–Zagier 1985, §9)'],
  ])('%s  (%s)', (claim) => {
    expect(checkOne(claim).verdict).toBe('proved');
  });
  it.each(['taylor(theta(z), 1) == 2*eta^3', 'taylor(phi_{10,1}, 2) == -Delta', 'taylor(phi_{0,1}, 0) == 10'])('mutant %s is refuted', (claim) => {
    expect(checkOne(claim).verdict).toBe('refuted');
  });
  it('the type is weight k + ν, index 0, the input multiplier', () => {
    const v = checkOne('taylor(theta(z), 1) is jacobi(weight 3/2, index 0, character eta^3) cusp');
    expect(v.verdict).toBe('proved');
  });
});

describe('the heat operator lands in the right space', () => {
  // Constants from the q⁰ slices (J^weak_{k+2,1} has the basis of Eichler–Zagier Thm 9.3):
  // H φ_{−2,1}: q⁰ slice of D_q − ¼D_ζ² − (−5/24)E_2 on ζ − 2 + ζ⁻¹ gives −(ζ + 10 + ζ⁻¹)/24;
  // H φ_{0,1}: −(1/4)(ζ + ζ⁻¹) + (1/24)(ζ + 10 + ζ⁻¹) = (5/12)·… ⇒ −5/24·E_4φ_{−2,1};
  // H E_{4,1}: −(7/24) at ζ⁰ only ⇒ a(ζ+10+ζ⁻¹) + b(ζ−2+ζ⁻¹) with a + b = 0, 12a = −7/24.
  it.each([
    ['heat(phi_{-2,1}) == -phi_{0,1}/24'],
    ['heat(phi_{0,1}) == -5/24*E_4*phi_{-2,1}'],
    ['heat(E_{4,1}) == -7/288*(E_6*phi_{0,1} - E_4^2*phi_{-2,1})'],
  ])('%s', (claim) => {
    expect(checkOne(claim).verdict).toBe('proved');
  });
  it('the constants agree with a second construction through Taylor coefficients and restriction', () => {
    // g_0 of both sides (the value at z = 0): φ_{0,1}(0) = 12, φ_{−2,1}(0) = 0, so
    // H E_{4,1} at z = 0 must be −7/288·12·E_6 = −7/24·E_6, and H φ_{−2,1} at z = 0 is −12/24 = −1/2.
    const vs = checkText(
      'let H = heat(E_{4,1})\nlet G = heat(phi_{-2,1})\nclaim "a": taylor(H, 0) == -7/24*E_6\nclaim "b": H(0) == -7/24*E_6\nclaim "c": taylor(G, 0) == -1/2\nclaim "d": taylor(G, 2) == -taylor(phi_{0,1}, 2)/24\n',
    );
    expect(vs.map((v) => [v.name, v.verdict])).toEqual([
      ['a', 'proved'],
      ['b', 'proved'],
      ['c', 'proved'],
      ['d', 'proved'],
    ]);
  });
  it.each(['heat(phi_{-2,1}) == -phi_{0,1}/12', 'heat(phi_{0,1}) == -5/24*E_4*phi_{0,1}', 'heat(E_{4,1}) == 7/288*(E_6*phi_{0,1} - E_4^2*phi_{-2,1})'])(
    'mutant %s is refuted or ill-typed',
    (claim) => {
      expect(['refuted', 'error']).toContain(checkOne(claim).verdict);
    },
  );
  it('heat on index 0 is an error (use serre)', () => {
    const v = checkOne('heat(E_4) == 0');
    expect(v.verdict).toBe('error');
    expect(v.reason).toMatch(/heat needs a non-zero index/);
  });
});

describe('V_l and T_p: preconditions and starts (MATH.md §7)', () => {
  it.each([
    ['V_2(theta(z)) == 0', 'V_2 needs trivial multiplier'],
    ['V_2(phi_{0,3/2}) == 0', 'V_2 needs integral index'],
    ['T_4(phi_{10,1}) == 0', 'T_4 needs p prime'],
    ['T_2(phi_{-1,2}) == 0', 'T_2 on index 2'],
    ['T_2(eta^3*theta(z)) == 0', 'T_2 needs trivial multiplier'],
  ])('%s → error: %s', (claim, text) => {
    const v = checkOne(claim);
    expect(v.verdict).toBe('error');
    expect(v.reason).toContain(text);
  });
  it('V_l can start below its input: V_2(Δ²) has a q¹ term (correction to MATH.md §7)', () => {
    // c′(1) = Σ_{a|(1,2)} a^{k−1} c(2/a²) = c(2) = 1, the q² coefficient of Δ² (OEIS A000594 squared: Δ² = q² − 48q³ + …)
    const v = checkOne('V_2(Delta^2) == 0');
    expect(v.verdict).toBe('refuted');
    expect(v.mismatch).toEqual({ q: '1', zeta: ['0'], left: '1', right: '0' });
  });
  it('T_p can start below its input when N_min > 0 (correction to MATH.md §7)', () => {
    // Δ·φ_{10,1} starts at q² (N_min = 4·2 − 1 = 7); c′(3) = c(12) + … reads the input at q³,
    // so T_2 of it has a q¹ term, below the (p²N_min + r²)/4 ≥ 7 that §7's formula gives.
    const s = expand('T_2(Delta*phi_{10,1})', 1);
    expect(rationalToString(coefficientAt(s, rat(1), 0))).not.toBe('0');
    expect(rationalToString(coefficientAt(expand('Delta*phi_{10,1}', 1), rat(1), 0))).toBe('0');
  });
  it('operators compose and need their inputs to a higher q-order', () => {
    expect(checkOne('V_2(U_3(phi_{0,1})) is jacobi(weight 0, index 18) weak').verdict).toBe('proved');
    expect(checkOne('taylor(heat(phi_{-2,1}), 0) == -1/2').verdict).toBe('proved');
    expect(checkOne('V_2(phi_{10,1}) is jacobi(weight 10, index 2) cusp').verdict).toBe('proved');
  });
});
