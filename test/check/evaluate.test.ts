/** The evaluator's structure: types by the product rule, structural cancellation, classes. */
import { describe, expect, it } from 'vitest';
import { parseExpression } from '../../src/lang/index.js';
import { newEvalContext, evaluate, expandMonomial } from '../../src/check/index.js';
import { monomialText } from '../../src/check/monomial.js';
import { monomialClass, monomialType } from '../../src/check/monomial-parts.js';
import { formatType, isConsistent } from '../../src/types/index.js';
import { rat, sliceCoefficient } from '../../src/series/index.js';

function value(text: string) {
  const p = parseExpression(text, ['z']);
  expect(p.diagnostics).toEqual([]);
  return evaluate(p.expr!, newEvalContext(text, ['z']));
}

describe('types by the rules of MATH.md §3', () => {
  it.each([
    ['theta(z)^3*theta(2z)^3*theta(3z)^2*theta(4z)*theta(5z)/eta^6', 'jacobi(weight 2, index 37, character eta^0)'],
    ['theta(z)*theta(2z)*theta(3z)/eta', 'jacobi(weight 1, index 7, character eta^8)'],
    ['phi_{0,1}(2z)', 'jacobi(weight 0, index 4)'],
    ['wp(3z)', 'jacobi(weight 2, index 0)'],
    ['Delta/eta^24', 'jacobi(weight 0, index 0)'],
    ['E_{4,1}(0)', 'jacobi(weight 4, index 0)'],
    ['theta(z)^2/eta^6', 'jacobi(weight -2, index 1)'],
  ])('%s has %s', (expr, type) => {
    // MATH.md §3: any product of thetas over a power of eta has weight (#θ − #η)/2,
    // index Σaᵢ²/2, D = 3·#θ − #η; ϑ(az)ϑ(bz)ϑ((a+b)z)/η has D = 8 (a character of order 3).
    const t = monomialType(value(expr), 1)!;
    expect(formatType(t).replace(', character eta^0', '')).toBe(type.replace(', character eta^0', ''));
    expect(isConsistent(t)).toBe(true);
  });
});

describe('structural cancellation and classes (MATH.md §4)', () => {
  it('Delta and eta^24 cancel; theta factors cancel by key', () => {
    expect(monomialText(value('Delta/eta^24'))).toBe('1');
    expect(monomialText(value('theta(z)^3/theta(z)^2'))).toBe('theta(z)');
    expect(monomialText(value('theta(-z)'))).toBe('-theta(z)');
    expect(monomialText(value('E_4*E_4 - 2*E_4^2'))).toBe('-E_4^2');
    expect(monomialText(value('E_4 - E_4'))).toBe('0');
  });
  it('classes: units invert, theta blocks by the divisor rule, everything else is meromorphic', () => {
    expect(monomialClass(value('E_4/eta^8'))).toBe('modular');
    expect(monomialClass(value('theta(2z)/theta(z)'))).toBe('modular');
    // divisor rule: order at points of exact order d is Σ_{d | a_i} e_i; here d = 1 gives 1 − 1 − 1 = −1
    expect(monomialClass(value('theta(6z)/(theta(2z)*theta(3z))'))).toBe('meromorphic');
    expect(monomialClass(value('theta(6z)*theta(z)/(theta(2z)*theta(3z))'))).toBe('modular');
    expect(monomialClass(value('1/E_4'))).toBe('meromorphic');
    expect(monomialClass(value('E_8 + Delta^2/E_4^4'))).toBe('meromorphic');
    expect(monomialClass(value('E_2*E_4'))).toBe('quasi');
    expect(monomialClass(value('Dz(phi_{0,1})'))).toBe('quasi');
  });
  it('a sum of meromorphic terms gets one common denominator', () => {
    const v = value('E_8 + Delta^2/E_4^4');
    const e = expandMonomial(v, 1, rat(3), 1e7, null);
    expect(e.denominator).toBe('E_4^4');
    expect(e.cls).toBe('meromorphic');
  });
  it('a holomorphic theta block restricted to z = 0 is its value, not 0/0', () => {
    // ϑ(2z)/ϑ(z) → 2 as z → 0 (D_ζϑ(τ,0) = η³ ≠ 0 and ϑ(2z) ≈ 2z·ϑ′): q⁰ coefficient 2
    const p = parseExpression('phi_{0,3/2}(0)', ['z']);
    const e = expandMonomial(evaluate(p.expr!, newEvalContext('', ['z'])), 1, rat(0), 1e7, null);
    expect(String(sliceCoefficient(e.series.slices[0]!, 0))).toBe('2');
  });
});
