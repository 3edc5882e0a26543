/**
 * Every multiplication algorithm against schoolbook on seeded random series
 * (ARCHITECTURE.md: each algorithm is tested against the naive one).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  JSBI,
  mulSchoolbook,
  mulSparseDense,
  mulKronecker,
  multiplySeries,
  polyMulKaratsuba,
  polyMulSchoolbook,
  type Int,
  truncateSeries,
  radd,
  rat,
  rcmp,
  rmin,
  valuationBound,
} from '../../src/series/index.js';
import { seriesArbitrary, seriesKey } from '../helpers/random-series.js';

const dense = seriesArbitrary({ slices: 9, width: 7, density: 0.9, bits: 70 });
const sparse = seriesArbitrary({ slices: 9, width: 7, density: 0.15, bits: 20 });
const SEED = 20261201;

describe('series multiplication algorithms agree with schoolbook', () => {
  it('sparse × dense', () => {
    fc.assert(
      fc.property(sparse, dense, (a, b) => {
        expect(seriesKey(mulSparseDense(a, b))).toBe(seriesKey(mulSchoolbook(a, b)));
        expect(seriesKey(mulSparseDense(b, a))).toBe(seriesKey(mulSchoolbook(a, b)));
      }),
      { seed: SEED, numRuns: 150 },
    );
  });
  it('sparse × dense in doubles when the height allows it, including near 2^53', () => {
    // small coefficients take the double-precision path (Σ|a|·max|b| < 2^53); 26-bit ones
    // with a few terms sit near the limit on either side of it
    for (const bits of [8, 24, 26]) {
      const small = seriesArbitrary({ slices: 9, width: 7, density: 0.15, bits });
      const wide = seriesArbitrary({ slices: 9, width: 7, density: 0.9, bits });
      fc.assert(
        fc.property(small, wide, (a, b) => {
          expect(seriesKey(mulSparseDense(a, b))).toBe(seriesKey(mulSchoolbook(a, b)));
        }),
        { seed: SEED, numRuns: 60 },
      );
    }
  });
  it('Kronecker substitution with Karatsuba', () => {
    fc.assert(
      fc.property(dense, dense, (a, b) => {
        expect(seriesKey(mulKronecker(a, b))).toBe(seriesKey(mulSchoolbook(a, b)));
      }),
      { seed: SEED, numRuns: 150 },
    );
  });
  it('the dispatcher', () => {
    fc.assert(
      fc.property(fc.oneof(sparse, dense), fc.oneof(sparse, dense), (a, b) => {
        expect(seriesKey(multiplySeries(a, b))).toBe(seriesKey(mulSchoolbook(a, b)));
      }),
      { seed: SEED, numRuns: 150 },
    );
  });
  it('Karatsuba on long random polynomials, balanced and unbalanced', () => {
    const poly = (n: number) => fc.array(fc.bigInt({ min: -(1n << 90n), max: 1n << 90n }), { minLength: n, maxLength: n });
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 300 }), fc.integer({ min: 1, max: 300 }), fc.nat(), (n, m, s) => {
        const gen = (len: number, salt: number): Int[] =>
          fc.sample(poly(len), { seed: s + salt, numRuns: 1 })[0]!.map((v) => JSBI.BigInt(v.toString()));
        const a = gen(n, 1);
        const b = gen(m, 2);
        expect(polyMulKaratsuba(a, b).map(String)).toEqual(polyMulSchoolbook(a, b).map(String));
      }),
      { seed: SEED, numRuns: 40 },
    );
  });
  it('a product claims only the q-order its factors determine', () => {
    // Extending the factors by arbitrary further slices must not change any
    // coefficient the shorter product claims to know.
    const long = seriesArbitrary({ slices: 14, width: 5, density: 0.7, bits: 30 });
    fc.assert(
      fc.property(long, long, fc.integer({ min: 0, max: 12 }), fc.integer({ min: 0, max: 12 }), (A, B, ca, cb) => {
        const a = truncateSeries(A, radd(A.start, rat(ca)));
        const b = truncateSeries(B, radd(B.start, rat(cb)));
        const short = multiplySeries(a, b);
        const full = multiplySeries(A, B);
        expect(seriesKey(truncateSeries(full, short.exactTo))).toBe(seriesKey(short));
        const va = valuationBound(a);
        const vb = valuationBound(b);
        expect(rcmp(short.exactTo, rmin(radd(a.exactTo, vb), radd(b.exactTo, va)))).toBe(0);
      }),
      { seed: SEED, numRuns: 200 },
    );
  });
});
