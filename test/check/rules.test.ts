/**
 * The rules of MATH.md §3–§6 as verdicts: units, divisors, classes, the margin and
 * assumptions, quasi-modular claims, meromorphic claims, type assertions.
 */
import { describe, expect, it } from 'vitest';
import { checkOne, checkText } from '../helpers/check.js';

describe('only constants and powers of η are units (MATH.md §4)', () => {
  it('E_8 + Δ²/E_4⁴ == E_4² is refuted, never proved (the counterexample of MATH.md §4)', () => {
    const v = checkOne('E_8 + Delta^2/E_4^4 == E_4^2');
    expect(v.verdict).toBe('refuted');
    expect(v.compared).toBe('cross-multiplied');
    // difference Δ²/E_4⁴ = q² + …: after multiplying by E_4⁴ the first mismatch is at q²
    expect(v.mismatch?.q).toBe('2');
  });
  it('division by η-powers is inversion as series: sides compared as they are', () => {
    const v = checkOne('phi_{10,1}/Delta == phi_{-2,1}');
    expect(v.verdict).toBe('proved');
    expect(v.compared).toBe('sides');
  });
  it('class takes no part in type equality: E_8/E_4 == E_4 is compared cross-multiplied and proved', () => {
    const v = checkOne('E_8/E_4 == E_4'); // E_8 = E_4² (dim M_8 = 1; OEIS A008410, A004009)
    expect(v.verdict).toBe('proved');
    expect(v.compared).toBe('cross-multiplied');
  });
  it('cancellation is structural: common divisors cancel before cross-multiplying', () => {
    const v = checkText('claim: (E_4^3 - E_6^2)/E_4 == 1728*Delta/E_4\n')[0]!;
    expect(v.verdict).toBe('proved');
    expect(v.normalForm?.leftMultipliedBy).toBe('1');
    expect(v.normalForm?.rightMultipliedBy).toBe('1');
  });
});

describe('identically zero divisors are errors (MATH.md §3)', () => {
  it.each([
    ['1/theta(0) == 0', 'division by zero'],
    ['1/theta(z - z) == 0', 'division by zero'],
    ['E_4/phi_{-2,1}(0) == 0', 'identically zero'],
    ['wp(0) == 0', 'division by zero'],
    ['E_4/(E_4 - E_4) == 0', 'division by zero'],
  ])('%s', (claim, text) => {
    const v = checkOne(claim);
    expect(v.verdict).toBe('error');
    expect(v.reason).toContain(text);
  });
  it('a meromorphic let restricted to z = 0 is 0/0, an error; a holomorphic theta block is its value', () => {
    const vs = checkText(
      'let F = theta(z)/theta(2z)\nlet G = theta(2z)/theta(z)\nclaim "F": F(0) == 1/2\nclaim "G": G(0) == 2\n',
    );
    expect(vs.find((v) => v.name === 'F')!.verdict).toBe('error');
    expect(vs.find((v) => v.name === 'G')!.verdict).toBe('proved');
  });
});

describe('sums must be well typed (MATH.md §3)', () => {
  it('an ill-typed sum is an error naming both terms, their types and the difference', () => {
    const v = checkOne('E_4 + E_6 == 0');
    expect(v.verdict).toBe('error');
    expect(v.reason).toBe("the terms of this sum have different types: 'E_4' has jacobi(weight 4, index 0), 'E_6' has jacobi(weight 6, index 0) (weight 4 vs 6)");
  });
  it('different types of the two sides refute, after showing a side is non-zero', () => {
    const v = checkOne('E_4 == E_6');
    expect(v.verdict).toBe('refuted');
    expect(v.leftType).toEqual({ weight: '4', index: '0', multiplier: 'trivial', class: 'modular' });
    expect(v.rightType).toEqual({ weight: '6', index: '0', multiplier: 'trivial', class: 'modular' });
  });
  it('different types but both sides identically zero: proved', () => {
    // φ_{−2,1}(0) has weight −2, index 0: M_{−2} = 0; Δ·φ_{−2,1}(0) likewise (weight 10, M_10 ∌ cusp forms… its bound 10/12 < 1 while Δ starts at q)
    const v = checkOne('phi_{-2,1}(0) == Delta*phi_{-2,1}(0)');
    expect(v.verdict).toBe('proved');
    expect(v.reason).toContain('both sides vanish identically');
  });
});

describe('quasi-modular claims are at best unproved (MATH.md §5)', () => {
  it("Ramanujan's D_qE_4 = (E_2E_4 − E_6)/3 is unproved with the agreement reported", () => {
    const v = checkOne('Dq(E_4) == (E_2*E_4 - E_6)/3'); // Ramanujan 1916, eq. (30)
    expect(v.verdict).toBe('unproved');
    expect(v.reason).toMatch(/E_2 is quasi-modular/);
    expect(v.reason).toMatch(/agree up to q\^\(21\/2\)/); // nominal bound 1/2 plus 10 q-steps
  });
  it('a mismatch within the nominal bound plus --depth refutes', () => {
    const v = checkOne('Dq(E_4)/240 == 0'); // D_qE_4 = 240Σnσ_3(n)qⁿ: q¹ coefficient 1, past the nominal bound 1/2
    expect(v.verdict).toBe('refuted');
    expect(v.mismatch).toEqual({ q: '1', zeta: ['0'], left: '1', right: '0' });
  });
  it('--depth bounds the comparison: with depth 0 the q¹ difference is not reached', () => {
    const v = checkOne('Dq(E_4)/240 == 0', { depth: 0 });
    expect(v.verdict).toBe('unproved');
  });
  it('assume gives "proved, assuming …"; a false assumption is caught by the margin', () => {
    const good = checkText(
      'let S = Dq(E_4) - E_2*E_4/3\nassume S is jacobi(weight 6, index 0)\nclaim: S == -E_6/3\n',
    )[0]!;
    expect(good.verdict).toBe('proved');
    expect(good.assumptions).toEqual(['S']);
    const bad = checkText('let F = Dq(E_4)/240\nassume F is jacobi(weight 6, index 0)\nclaim: F == 0\n')[0]!;
    expect(bad.verdict).toBe('error');
    expect(bad.reason).toMatch(/^assumption F is false/);
  });
  it('assume on a definition that already has a proven type is an error', () => {
    const vs = checkText('let A = E_4\nassume A is jacobi(weight 4, index 0)\nclaim: A == E_4\n');
    expect(vs.some((v) => v.verdict === 'error' && /assume is only for quasi-modular/.test(v.reason ?? ''))).toBe(true);
  });
});

describe('meromorphic claims', () => {
  it('φ_{0,1}/φ_{−2,1} == 12℘̃ is proved cross-multiplied, naming the factors', () => {
    const v = checkOne('phi_{0,1}/phi_{-2,1} == 12*wp(z)');
    expect(v.verdict).toBe('proved');
    expect(v.compared).toBe('cross-multiplied');
    expect(v.normalForm?.leftMultipliedBy).toBe('theta(z)^2');
    expect(v.normalForm?.rightMultipliedBy).toBe('phi_{-2,1}');
  });
  it('a type assertion on a quotient with a pole in z is refuted by failed slice division', () => {
    const v = checkOne('theta(z)/phi_{0,1} is jacobi(weight 1/2, index -1/2, character eta^3)');
    expect(v.verdict).toBe('refuted');
    expect(v.reason).toMatch(/pole in z/);
  });
  it('a type assertion on a quotient by E_4 stays unproved (a pole in τ cannot be seen in slices)', () => {
    const v = checkOne('Delta/E_4 is jacobi(weight 8, index 0)');
    expect(v.verdict).toBe('unproved');
  });
});

describe('type assertions with qualifiers (MATH.md §6)', () => {
  it.each([
    ['phi_{10,1} is jacobi(weight 10, index 1) cusp', 'proved'],
    ['phi_{12,1} is jacobi(weight 12, index 1) cusp', 'proved'],
    ['E_{4,1} is jacobi(weight 4, index 1) holomorphic', 'proved'],
    ['E_{4,1} is jacobi(weight 4, index 1) cusp', 'refuted'],
    ['phi_{0,1} is jacobi(weight 0, index 1) weak', 'proved'],
    ['phi_{0,1} is jacobi(weight 0, index 1) holomorphic', 'refuted'],
    ['phi_{-2,1} is jacobi(weight -2, index 1) holomorphic', 'refuted'],
    ['phi_{0,3/2} is jacobi(weight 0, index 3/2) weak', 'proved'],
    ['1/Delta is jacobi(weight -12, index 0) weak', 'refuted'],
    ['1/Delta is jacobi(weight -12, index 0)', 'proved'],
    // every coefficient of ϑ has 4mx − r² = 2·n²/8 − n²/4 = 0 (MATH.md §2): holomorphic, not cusp
    ['theta(z) is jacobi(weight 1/2, index 1/2, character eta^3) holomorphic', 'proved'],
    ['theta(z) is jacobi(weight 1/2, index 1/2, character eta^3) cusp', 'refuted'],
    ['theta(z) is jacobi(weight 1/2, index 3/2, character eta^3)', 'refuted'],
    ['eta^3 is jacobi(weight 3/2, index 0, character eta^3) cusp', 'proved'],
  ])('%s → %s', (claim, verdict) => {
    const v = checkOne(claim);
    expect(v.verdict, v.reason).toBe(verdict);
  });
  it('an inconsistent written type is an error', () => {
    expect(checkOne('theta(z) is jacobi(weight 1/2, index 1/2)').verdict).toBe('error'); // 2k = 1, D = 0
    const v = checkOne('E_4 is jacobi(weight 1/2, index 0)');
    expect(v.verdict).toBe('error');
    expect(v.reason).toMatch(/not consistent/);
  });
});

describe('claim files', () => {
  it('a file with a syntax error still gets its good claims checked', () => {
    const vs = checkText('claim "good": E_4^2 == E_8\nclaim "bad": E_4 == (E_6\nclaim "also good": E_4*E_6 == E_{10}\n');
    expect(vs.map((v) => [v.name, v.verdict])).toEqual([
      ['good', 'proved'],
      ['test.claim:3', 'error'], // an unclosed bracket is reported where the next statement starts (CLAIMS.md)
      ['also good', 'proved'],
    ]);
  });
  it('a duplicate claim name makes the later claim an error', () => {
    const vs = checkText('claim "x": E_4^2 == E_8\nclaim "x": E_4^2 == E_8\n');
    expect(vs.map((v) => v.verdict)).toEqual(['proved', 'error']);
    expect(vs[1]!.reason).toContain("already exists");
  });
  it('a claim whose bound needs more than --max-terms is refused with the estimate', () => {
    const v = checkOne('E_4^100 == E_4^100', { maxTerms: 10 }); // bound 400/12: 34 coefficients
    expect(v.verdict).toBe('error');
    expect(v.reason).toMatch(/would need about .* coefficients, more than --max-terms 10;/);
  });
});
