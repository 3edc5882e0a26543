/**
 * The modular route of a check (MATH.md §8; check/compare-residues.ts) against the exact
 * engine: the same verdicts, first mismatches, coefficient counts and digests on every
 * bundled claim and on mutants; a mismatch is found where a single coefficient was
 * changed, with exact values; certificates record the primes and the height bound, and
 * recheck confirms them by the same route and by the exact engine, refusing tampering.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readdirSync, readFileSync } from 'node:fs';
import {
  type Rational,
  JSBI,
  int,
  rat,
  linearCombination,
  monomialSeries,
  nttPrimes,
  residuesOfSeries,
  rationalToString,
  lcm,
} from '../../src/series/index.js';
import { certificateOf, recheck, DEFAULT_CHECK_OPTIONS, type CheckOptions } from '../../src/check/index.js';
import { compareResiduesTo, type ModularSides } from '../../src/check/compare-residues.js';
import { compareTo, defaultZetaNorm } from '../../src/check/compare-series.js';
import type { Certificate, Verdict } from '../../src/verdict/index.js';
import { checkText, checkOne } from '../helpers/check.js';
import { parseExpression } from '../../src/lang/index.js';
import { newEvalContext, evaluate, expandMonomial } from '../../src/check/index.js';
import { type QZSeries, isZeroSeries, subtractSeries, expandModular } from '../../src/series/index.js';
import { numeratorSource } from '../../src/check/monomial-source.js';
import { monomialType } from '../../src/check/monomial-parts.js';
import { estimateTermsForType } from '../../src/check/estimate.js';
import { MODULAR_MIN_TERMS, MODULAR_MAX_PRIMES } from '../../src/check/route-choice.js';

function sideSeries(text: string, X: Rational): QZSeries {
  const p = parseExpression(text, ['z']);
  return expandMonomial(evaluate(p.expr!, newEvalContext(text, ['z'])), 1, X, 1e8, null).series;
}

/** What the two routes must agree on. */
function essence(v: Verdict): unknown {
  return [v.name, v.verdict, v.mismatch, v.bound?.coefficientsChecked, v.bound?.qOrder, v.evidence?.sha256, v.reason];
}

function bothRoutes(text: string, file: string, opts: Partial<CheckOptions> = {}): [Verdict[], Verdict[]] {
  return [
    checkText(text, { ...opts, arithmetic: 'exact', evidence: true }, file),
    checkText(text, { ...opts, arithmetic: 'modular', evidence: true }, file),
  ];
}

describe('the modular route agrees with the exact engine', () => {
  const files = readdirSync('claims').filter((f) => f.endsWith('.claim'));
  it.each(files)('claims/%s', (f) => {
    const [exact, modular] = bothRoutes(readFileSync(`claims/${f}`, 'utf8'), `claims/${f}`);
    expect(modular.map(essence)).toEqual(exact.map(essence));
    expect(exact.every((v) => v.route === undefined)).toBe(true);
  });

  it('takes the route on one-variable comparisons and records primes whose product exceeds twice the height', () => {
    const [, modular] = bothRoutes(readFileSync('claims/notebook.claim', 'utf8'), 'claims/notebook.claim');
    const routed = modular.filter((v) => v.route !== undefined);
    expect(routed.length).toBeGreaterThan(3);
    for (const v of routed) {
      let M = int(1);
      for (const p of v.route!.primes) M = JSBI.multiply(M, int(p));
      // M > 2·2^b (MATH.md §8)
      expect(JSBI.greaterThan(M, JSBI.exponentiate(int(2), int(v.route!.heightBits + 1)))).toBe(true);
    }
  });

  // Eichler–Zagier 1985, Thm 9.3 and §9 (the weak generators and the cusp forms φ_{10,1}, φ_{12,1})
  const mutants = [
    'Delta*phi_{-2,1} == (E_6*E_{4,1} - E_4*E_{6,1})/143',
    'Delta*phi_{0,1} == (E_4^2*E_{4,1} - 2*E_6*E_{6,1})/144',
    'E_4^3 - E_6^2 == 1729*Delta',
    'E_4^30 * phi_{-2,1}^20 == E_4^30 * theta(z)^40 / eta^120 + Delta^10 * phi_{-2,1}^20',
    'phi_{0,1}/phi_{-2,1} == 11*wp(z)',
    'E_{12,1} == E_4^2*E_{4,1} + phi_{12,1}',
  ];
  it.each(mutants)('mutant %s: the same first mismatch, recovered exactly', (m) => {
    const exact = checkOne(m, { arithmetic: 'exact' });
    const modular = checkOne(m, { arithmetic: 'modular' });
    expect(exact.verdict).toBe('refuted');
    expect(modular.verdict).toBe('refuted');
    expect(modular.mismatch).toEqual(exact.mismatch);
    expect(modular.route?.primes.length).toBeGreaterThan(0);
  });

  it('auto takes the modular route only for large comparisons', () => {
    const small = checkOne('theta(z)^2/eta^6 == phi_{-2,1}');
    const large = checkOne('E_4^30 * phi_{-2,1}^20 == E_4^30 * theta(z)^40 / eta^120');
    expect(small.route).toBeUndefined();
    expect(large.verdict).toBe('proved');
    expect(large.route?.primes.length).toBeGreaterThan(1);
  });
});

describe('expand takes the modular route for large orders', () => {
  it('E_4^30·φ_{−2,1}^20 to q^10 equals the exact engine', () => {
    const text = 'E_4^30 * phi_{-2,1}^20';
    const p = parseExpression(text, ['z']);
    const m = evaluate(p.expr!, newEvalContext(text, ['z']));
    // the route's conditions hold here, so expand goes through residues (route-choice.ts)
    const src = numeratorSource(m);
    expect(estimateTermsForType(monomialType(m, 1)!, src.valuation, rat(10))).toBeGreaterThanOrEqual(MODULAR_MIN_TERMS);
    expect(expandModular(src, rat(10), MODULAR_MAX_PRIMES)).not.toBeNull();
    const viaExpand = expandMonomial(m, 1, rat(10), 1e8, null).series;
    const exact = numeratorSource(m).expand(rat(10));
    expect(isZeroSeries(subtractSeries(viaExpand, exact))).toBe(true);
    expect(viaExpand.exactTo).toEqual(rat(10));
  });
});

describe('compareResiduesTo finds a changed coefficient where it was changed', () => {
  const base = sideSeries('phi_{0,1}*phi_{-2,1}*E_4', rat(6));
  const primes = nttPrimes().slice(0, 2);
  it('φ_{0,1}φ_{−2,1}E_4 with one coefficient changed by a rational', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 6 }), fc.integer({ min: -8, max: 8 }), fc.integer({ min: -5, max: 5 }).filter((b) => b !== 0), fc.integer({ min: 1, max: 7 }), (q, l, bump, den) => {
        const d: Rational = rat(bump, den);
        const changed = linearCombination([
          { series: base, coefficient: rat(1) },
          { series: monomialSeries(d, rat(q), 2 * l, base.exactTo), coefficient: rat(1) },
        ]);
        const D = lcm(base.den, changed.den);
        const sides: ModularSides = {
          left: residuesOfSeries(base, primes),
          right: residuesOfSeries(changed, primes),
          leftMajorant: null as never,
          rightMajorant: null as never,
          den: D,
          route: { primes: primes.map((p) => p.p), heightBits: 50 },
        };
        const c = compareResiduesTo(sides, base.exactTo, defaultZetaNorm);
        const e = compareTo(base, changed, base.exactTo);
        expect(c.mismatch).not.toBeNull();
        expect(rationalToString(c.mismatch!.q)).toBe(String(q));
        expect(c.mismatch!.zetaHalves).toEqual([2 * l]);
        expect(rationalToString(c.mismatch!.left)).toBe(rationalToString(e.mismatch!.left));
        expect(rationalToString(c.mismatch!.right)).toBe(rationalToString(e.mismatch!.right));
        expect(c.compared).toBe(e.compared);
      }),
      { seed: 7, numRuns: 40 },
    );
  });
});

describe('certificates of modular proofs', () => {
  const FILE = `# chapter 7, two lines of it
claim "a high power": E_4^30 * phi_{-2,1}^20 == E_4^30 * theta(z)^40 / eta^120
claim "the cusp form of weight 12": E_4^3 - E_6^2 == 1728*Delta
`;
  const certs = (): Certificate[] =>
    checkText(FILE, { evidence: true, arithmetic: 'modular' }, 'chapter7.claim')
      .map((v) => certificateOf(v, '9.9.9'))
      .filter((c): c is Certificate => c !== null);

  it('record the route and are confirmed by recheck', () => {
    const cs = certs();
    expect(cs).toHaveLength(2);
    for (const c of cs) {
      expect(c.route.route).toBe('modular');
      expect(recheck(c, DEFAULT_CHECK_OPTIONS, '9.9.9').status).toBe('confirmed');
    }
  });

  it('a changed height bound or prime list is caught at the route step', () => {
    const c = certs()[0]!;
    if (c.route.route !== 'modular') throw new Error('expected a modular route');
    const lower = { ...c, route: { ...c.route, heightBits: c.route.heightBits - 100 } };
    const r1 = recheck(lower, DEFAULT_CHECK_OPTIONS, '9.9.9');
    expect(r1.status).toBe('disagrees');
    if (r1.status === 'disagrees') expect(r1.step).toBe('route');
    const fewer = { ...c, route: { ...c.route, primes: c.route.primes.slice(1) } };
    const r2 = recheck(fewer, DEFAULT_CHECK_OPTIONS, '9.9.9');
    expect(r2.status).toBe('disagrees');
    if (r2.status === 'disagrees') expect(r2.step).toBe('route');
  });

  it('a digest changed on a modular certificate is caught', () => {
    const c = certs()[1]!;
    const bad = { ...c, comparison: { ...c.comparison!, digest: { ...c.comparison!.digest, value: '0'.repeat(64) } } };
    const r = recheck(bad, DEFAULT_CHECK_OPTIONS, '9.9.9');
    expect(r.status).toBe('disagrees');
    if (r.status === 'disagrees') expect(r.step).toBe('digest');
  });
});

describe('the margin check works on the modular route', () => {
  it('a type made too light shows as an internal error, never a proof', () => {
    // Theorem A's bound for weight 80, index 20 is q^10; pretending weight 8 makes it q^4
    const v = checkOne('E_4^30 * phi_{-2,1}^20 == E_4^30 * theta(z)^40 / eta^120 + Delta^10 * phi_{-2,1}^20', {
      arithmetic: 'modular',
      margin: 8,
      adjustTypeForTest: (t) => ({ ...t, weight: rat(8) }),
    });
    expect(v.verdict).toBe('error');
    expect(v.reason).toMatch(/internal error/);
  });
});
