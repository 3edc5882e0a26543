/**
 * Linear combinations of residue series with rational coefficients (denominators such
 * as 691 and 4 included) against the exact engine's `linearCombination`, on grids with
 * different starts, q-denominators and ζ-offsets.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  type Int,
  type Rational,
  JSBI,
  int,
  rat,
  lcm,
  rcmp,
  rationalToString,
  linearCombination,
  residuesOfSeries,
  seriesOfResidues,
  combineResidues,
  alignResidues,
  makeSeries,
  nttPrimes,
  coefficientAt,
} from '../../../src/series/index.js';
import { seriesArb, maxNumerator, primesAbove, residueTerms, expectSameSeries, expectWellFormed, primeSetArb } from './residue-helpers.js';

const SEED = 691;

const coefficientArb: fc.Arbitrary<Rational> = fc.oneof(
  fc.constantFrom(rat(1, 691), rat(-3, 4), rat(0), rat(1), rat(-1), rat(5, 12), rat(-1728), rat(65520, 691)),
  fc.tuple(fc.integer({ min: -1000, max: 1000 }), fc.integer({ min: 1, max: 1000 })).map(([n, d]) => rat(n, d)),
);

describe('residue linear combinations against the exact engine', () => {
  it('2–4 terms on mixed grids, rational coefficients', () => {
    const term = fc.record({
      series: seriesArb({ maxRows: 6, width: 4, bits: [1, 10, 35] }),
      coefficient: coefficientArb,
    });
    fc.assert(
      fc.property(fc.array(term, { minLength: 1, maxLength: 4 }), primeSetArb(), (terms, anyPrimes) => {
        // a term with coefficient 0 contributes nothing but limits the order, as in linearCombination
        const live = terms.filter((t) => !JSBI.equal(t.coefficient.num, int(0)));
        if (live.length === 0) return;
        const want = linearCombination(terms);
        let D: Int = int(1);
        for (const t of terms) D = lcm(D, JSBI.multiply(t.series.den, t.coefficient.den));
        const height = JSBI.divide(JSBI.multiply(maxNumerator(want), D), want.den);
        const primes = primesAbove(height);
        const r = combineResidues(
          terms.map((t) => ({ series: residuesOfSeries(t.series, primes), coefficient: t.coefficient })),
          primes,
        );
        expectWellFormed(r);
        expect(rationalToString(r.exactTo)).toBe(rationalToString(want.exactTo));
        expectSameSeries(seriesOfResidues(r, D), want);
        // modulo arbitrary primes (no table prime divides 691, 4 or the denominators ≤ 1000)
        const s = combineResidues(
          terms.map((t) => ({ series: residuesOfSeries(t.series, anyPrimes), coefficient: t.coefficient })),
          anyPrimes,
        );
        expect(residueTerms(s)).toEqual(residueTerms(residuesOfSeries(want, anyPrimes)));
      }),
      { seed: SEED, numRuns: 150 },
    );
  });

  it('(E_4 − E_6)/1728 from the first coefficients: rationals back through CRT', () => {
    // E_4 = 1 + 240q + 2160q² + 6720q³, E_6 = 1 − 504q − 16632q² − 122976q³ (OEIS A004009, A013973)
    const e4 = makeSeries(rat(0), 1, int(1), [1, 240, 2160, 6720].map((v) => ({ lo: 0, c: [int(v)] })), rat(3));
    const e6 = makeSeries(rat(0), 1, int(1), [1, -504, -16632, -122976].map((v) => ({ lo: 0, c: [int(v)] })), rat(3));
    const primes = nttPrimes().slice(0, 2);
    const r = combineResidues(
      [
        { series: residuesOfSeries(e4, primes), coefficient: rat(1, 1728) },
        { series: residuesOfSeries(e6, primes), coefficient: rat(-1, 1728) },
      ],
      primes,
    );
    const back = seriesOfResidues(r, int(1728));
    expect(rationalToString(back.exactTo)).toBe('3');
    // 744/1728, 18792/1728, 129696/1728 in lowest terms
    expect([0, 1, 2, 3].map((n) => rationalToString(coefficientAt(back, rat(n), 0)))).toEqual(['0', '31/72', '87/8', '1351/18']);
  });

  it('all coefficients zero: the zero series to the least order', () => {
    const a = makeSeries(rat(1, 8), 2, int(3), [{ lo: 1, c: [int(5)] }, { lo: 0, c: [] }], rat(5, 8));
    const b = makeSeries(rat(-1), 1, int(1), [{ lo: 0, c: [int(7)] }, { lo: 0, c: [int(1)] }], rat(0));
    const primes = nttPrimes().slice(0, 1);
    const r = combineResidues(
      [
        { series: residuesOfSeries(a, primes), coefficient: rat(0) },
        { series: residuesOfSeries(b, primes), coefficient: rat(0) },
      ],
      primes,
    );
    expect(rationalToString(r.exactTo)).toBe('0');
    expect(residueTerms(r)).toEqual([]);
  });

  it('a coefficient whose denominator is one of the primes is refused, not reduced wrongly', () => {
    const primes = nttPrimes().slice(0, 2);
    const a = residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [int(1)] }], rat(0)), primes);
    expect(() => combineResidues([{ series: a, coefficient: rat(1, primes[1]!.p) }], primes)).toThrow(RangeError);
  });

  it('aligning series over different prime sets is refused', () => {
    const a = residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [int(1)] }], rat(0)), nttPrimes().slice(0, 1));
    const b = residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [int(1)] }], rat(0)), nttPrimes().slice(0, 1));
    expect(() => alignResidues([a, b])).toThrow(RangeError);
    expect(rcmp(alignResidues([a, a]).exactTo, rat(0))).toBe(0);
  });

  // Regression: alignResidues copies each term's rows at its row
  // shift even when nothing is left to copy; a term starting past the common q-order has a
  // shift beyond the output and Int32Array.set throws "offset is out of bounds". Reached
  // from sources too: expandModular(sumSource([E_4, η^48]), 1/2) throws the same way.
  it('a term starting past the common order: 2q^{−1/4} (to q^{−1/4}) + 5q^{3/8} (to q^{3/8})', () => {
    const primes = nttPrimes().slice(0, 1);
    const a = makeSeries(rat(-1, 4), 1, int(1), [{ lo: 0, c: [int(2)] }], rat(-1, 4));
    const b = makeSeries(rat(3, 8), 1, int(1), [{ lo: 0, c: [int(5)] }], rat(3, 8));
    const r = combineResidues(
      [
        { series: residuesOfSeries(a, primes), coefficient: rat(1) },
        { series: residuesOfSeries(b, primes), coefficient: rat(1) },
      ],
      primes,
    );
    expect(rationalToString(r.exactTo)).toBe('-1/4');
    expect(residueTerms(r)).toEqual(['-1/4 0 2']);
  });
});
