/**
 * Mutation tests (issue: soundness is the product). Every true identity is proved;
 * every mutant — a changed constant, exponent or single coefficient — is never proved:
 * it is refuted, or an error where the change makes a sum ill-typed (MATH.md §3). The
 * first mismatch reported is the real first one, checked by brute force.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseExpression } from '../../src/lang/index.js';
import { newEvalContext, evaluate, expandMonomial } from '../../src/check/index.js';
import {
  type QZSeries,
  type Rational,
  rat,
  radd,
  rcmp,
  coefficientAt,
  rationalToString,
  parseRational,
  linearCombination,
  monomialSeries,
  req,
  rmin,
  leadingExponent,
} from '../../src/series/index.js';
import { compareTo } from '../../src/check/compare-series.js';
import { checkOne } from '../helpers/check.js';

interface Identity {
  readonly claim: string;
  readonly source: string;
  readonly mutants: readonly string[];
}

const IDENTITIES: readonly Identity[] = [
  {
    claim: 'theta(z)^2/eta^6 == phi_{-2,1}',
    source: 'MATH.md §2 (definition); Eichler–Zagier 1985 §9',
    mutants: ['theta(z)^2/eta^6 == 2*phi_{-2,1}', 'theta(z)^4/eta^6 == phi_{-2,1}', 'theta(z)^2/eta^5 == phi_{-2,1}', 'theta(2z)^2/eta^6 == phi_{-2,1}'],
  },
  {
    claim: 'Delta*phi_{-2,1} == (E_6*E_{4,1} - E_4*E_{6,1})/144',
    source: 'Eichler–Zagier 1985, Thm 9.3',
    mutants: [
      'Delta*phi_{-2,1} == (E_6*E_{4,1} - E_4*E_{6,1})/143',
      'Delta*phi_{-2,1} == (E_6*E_{4,1} + E_4*E_{6,1})/144',
      'Delta*phi_{-2,1} == (E_6^2*E_{4,1} - E_4*E_{6,1})/144',
      'Delta^2*phi_{-2,1} == (E_6*E_{4,1} - E_4*E_{6,1})/144',
    ],
  },
  {
    claim: 'Delta*phi_{0,1} == (E_4^2*E_{4,1} - E_6*E_{6,1})/144',
    source: 'Eichler–Zagier 1985, Thm 9.3',
    mutants: ['Delta*phi_{0,1} == (E_4^2*E_{4,1} - E_6*E_{6,1})/145', 'Delta*phi_{0,1} == (E_4^2*E_{4,1} - 2*E_6*E_{6,1})/144', 'Delta*phi_{0,1}^2 == (E_4^2*E_{4,1} - E_6*E_{6,1})/144'],
  },
  {
    claim: 'E_4^3 - E_6^2 == 1728*Delta',
    source: 'OEIS A000594, A004009, A013973',
    mutants: ['E_4^3 - E_6^2 == 1729*Delta', 'E_4^3 - E_6^2 == 1728*Delta^2', 'E_4^3 - E_6^3 == 1728*Delta'],
  },
  {
    claim: 'phi_{0,1}/phi_{-2,1} == 12*wp(z)',
    source: 'MATH.md §2 (℘̃ row), cross-multiplied',
    mutants: ['phi_{0,1}/phi_{-2,1} == 11*wp(z)', 'phi_{0,1}/phi_{-2,1} == 12*wp(2z)', 'phi_{0,1}/phi_{-2,1}^2 == 12*wp(z)'],
  },
  {
    claim: '432*phi_{-1,2}^2 == phi_{-2,1}*(phi_{0,1}^3 - 3*E_4*phi_{-2,1}^2*phi_{0,1} + 2*E_6*phi_{-2,1}^3)',
    source: '(memory) MATH.md §2, confirmed in test/published/jacobi-identities',
    mutants: [
      '431*phi_{-1,2}^2 == phi_{-2,1}*(phi_{0,1}^3 - 3*E_4*phi_{-2,1}^2*phi_{0,1} + 2*E_6*phi_{-2,1}^3)',
      '432*phi_{-1,2}^2 == phi_{-2,1}*(phi_{0,1}^3 - 2*E_4*phi_{-2,1}^2*phi_{0,1} + 2*E_6*phi_{-2,1}^3)',
      '432*phi_{-1,2}^2 == phi_{-2,1}*(phi_{0,1}^3 - 3*E_4*phi_{-2,1}^2*phi_{0,1} + 2*E_6*phi_{-2,1}^2)',
    ],
  },
  {
    claim: 'theta(2z)/theta(z) == phi_{0,3/2}',
    source: 'MATH.md §2 (definition)',
    mutants: ['theta(3z)/theta(z) == phi_{0,3/2}', 'theta(2z)/theta(z) == -phi_{0,3/2}', 'theta(2z)^2/theta(z)^2 == phi_{0,3/2}'],
  },
  {
    claim: 'E_4*E_6 == E_{10}',
    source: 'dim M_10 = 1 (common practice, no source); OEIS A013974',
    mutants: ['E_4*E_6 == 2*E_{10}', 'E_4^2*E_6 == E_{10}', 'E_4*E_6 == E_{10} + Delta'],
  },
  {
    claim: 'E_{6,1}(0) == E_6',
    source: 'Eichler–Zagier 1985, Thm 2.1 (E_{k,1}(τ,0) = E_k since dim M_k = 1)',
    mutants: ['E_{6,1}(0) == -E_6', 'E_{6,1}(2z) == E_6', 'E_{6,1}(0) == E_6^2'],
  },
];

function sideSeries(text: string, X: Rational): QZSeries {
  const p = parseExpression(text, ['z']);
  return expandMonomial(evaluate(p.expr!, newEvalContext(text, ['z'])), 1, X, 1e8, null).series;
}

/** The first (q, then |ℓ|, then ℓ) position where two series differ, by brute force over a box. */
function bruteFirstMismatch(a: QZSeries, b: QZSeries, X: Rational): { q: string; zeta: string; left: string; right: string } | null {
  const start = rmin(a.start, b.start);
  for (let x = start; rcmp(x, X) <= 0; x = radd(x, rat(1, 24))) {
    for (let h = 0; h <= 200; h++) {
      for (const e of h === 0 ? [0] : [-h, h]) {
        const l = coefficientAt(a, x, e);
        const r = coefficientAt(b, x, e);
        if (!req(l, r)) return { q: rationalToString(x), zeta: rationalToString(rat(e, 2)), left: rationalToString(l), right: rationalToString(r) };
      }
    }
  }
  return null;
}

describe('true identities are proved', () => {
  it.each(IDENTITIES.map((i) => [i.claim, i.source]))('%s  (%s)', (claim) => {
    const v = checkOne(claim);
    expect(v.verdict, v.reason).toBe('proved');
  });
});

describe('mutants are never proved', () => {
  const all = IDENTITIES.flatMap((i) => i.mutants);
  it.each(all)('%s', (mutant) => {
    const v = checkOne(mutant);
    expect(['refuted', 'error']).toContain(v.verdict);
    if (v.verdict === 'error') expect(v.reason).toMatch(/different types/);
    if (v.verdict === 'refuted' && v.mismatch && v.compared === 'sides') {
      const [left, right] = mutant.split(' == ') as [string, string];
      const X = parseRational(v.bound?.qOrder ?? v.mismatch.q)!;
      const brute = bruteFirstMismatch(sideSeries(left, X), sideSeries(right, X), X);
      expect(brute).toEqual({ q: v.mismatch.q, zeta: v.mismatch.zeta[0], left: v.mismatch.left, right: v.mismatch.right });
    }
  });
});

describe('a single changed coefficient is found exactly where it was changed', () => {
  const E4 = sideSeries('E_4^3 - E_6^2', rat(6));
  const phi = sideSeries('phi_{0,1}*phi_{-2,1}', rat(6));
  it.each([
    ['E_4^3 − E_6^2', E4],
    ['φ_{0,1}φ_{−2,1}', phi],
  ])('%s', (_name, base) => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 6 }), fc.integer({ min: -8, max: 8 }), fc.integer({ min: 1, max: 5 }), (q, halves, bump) => {
        const e = halves * 2;
        const changed = linearCombination([
          { series: base, coefficient: rat(1) },
          { series: monomialSeries(rat(bump), rat(q), e, base.exactTo), coefficient: rat(1) },
        ]);
        const c = compareTo(base, changed, base.exactTo);
        expect(c.mismatch).not.toBeNull();
        expect(rationalToString(c.mismatch!.q)).toBe(String(q));
        expect(c.mismatch!.zetaHalves).toEqual([e]);
        expect(leadingExponent(base)).not.toBeNull();
      }),
      { seed: 42, numRuns: 60 },
    );
  });
});
