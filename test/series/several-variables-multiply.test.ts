/**
 * Products of series in several variables (mul-schoolbook.ts with sparse-accumulator.ts)
 * against a naive product in the language's own integers: exponent vectors packed into
 * one number or keyed by text (wide exponents in many variables), numerators from ±1 to
 * 2^60, and sums of small products that pass 2^52 and must go on exactly.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { type Int, type QZSeries, type Slice, JSBI, int, rat, makeSeries, multiplySeries, forEachTerm } from '../../src/series/index.js';

const SEED = 2718;

type Terms = Map<string, bigint>;

/** Test oracle: each slice as exponent text → numerator, in the language's integers. */
function termsOf(s: QZSeries): Terms[] {
  return s.slices.map((sl) => {
    const m: Terms = new Map();
    forEachTerm(sl, (e, v) => m.set(e.join(','), BigInt(v.toString())));
    return m;
  });
}

function naiveProduct(a: Terms[], b: Terms[], rows: number): Terms[] {
  const out: Terms[] = Array.from({ length: rows }, () => new Map());
  a.forEach((ta, i) =>
    b.forEach((tb, j) => {
      if (i + j >= rows) return;
      for (const [ea, va] of ta) {
        for (const [eb, vb] of tb) {
          const e = ea.split(',').map((x, k) => Number(x) + Number(eb.split(',')[k])).join(',');
          out[i + j]!.set(e, (out[i + j]!.get(e) ?? 0n) + va * vb);
        }
      }
    }),
  );
  for (const m of out) for (const [e, v] of m) if (v === 0n) m.delete(e);
  return out;
}

function sparseSeries(n: number, rows: readonly (readonly [readonly number[], bigint][])[]): QZSeries {
  const slices: Slice[] = rows.map((terms) => {
    const merged = new Map<string, [readonly number[], bigint]>();
    for (const [e, v] of terms) {
      const k = e.join(',');
      merged.set(k, [e, (merged.get(k)?.[1] ?? 0n) + v]);
    }
    const live = [...merged.values()].filter(([, v]) => v !== 0n);
    return { kind: 'sparse', n, exps: live.map(([e]) => e), vals: live.map(([, v]): Int => JSBI.BigInt(v.toString())) };
  });
  return makeSeries(rat(0), 1, int(1), slices, rat(rows.length - 1), n);
}

const seriesArb = (n: number, maxExp: number, values: fc.Arbitrary<bigint>): fc.Arbitrary<QZSeries> =>
  fc
    .array(fc.array(fc.tuple(fc.array(fc.integer({ min: -maxExp, max: maxExp }), { minLength: n, maxLength: n }), values), { maxLength: 6 }), { minLength: 1, maxLength: 5 })
    .map((rows) => sparseSeries(n, rows));

function expectProduct(a: QZSeries, b: QZSeries): void {
  const got = termsOf(multiplySeries(a, b));
  const want = naiveProduct(termsOf(a), termsOf(b), got.length);
  expect(got.map((m) => [...m].sort())).toEqual(want.map((m) => [...m].sort()));
}

describe('several-variable products against a naive product', () => {
  const values = fc.oneof(fc.constantFrom(1n, -1n, 2n), fc.bigInt({ min: -(1n << 25n), max: 1n << 25n }), fc.bigInt({ min: -(1n << 60n), max: 1n << 60n }));
  it('packed exponents (2–4 variables, small ranges), numerators from ±1 to 2^60', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 4 }).chain((n) => fc.tuple(seriesArb(n, 4, values), seriesArb(n, 4, values))), ([a, b]) => expectProduct(a, b)),
      { seed: SEED, numRuns: 150 },
    );
  });
  it('text-keyed exponents: 9 variables with coordinates up to ±400', () => {
    fc.assert(
      fc.property(fc.tuple(seriesArb(9, 400, values), seriesArb(9, 400, values)), ([a, b]) => expectProduct(a, b)),
      { seed: SEED, numRuns: 40 },
    );
  });
  it('sums of products below 2^52 that pass it: ((2^25 + 1)·Σ_{k<40} ζ₁^k ζ₂^−k)², odd products', () => {
    const big = (1n << 25n) + 1n;
    const terms = Array.from({ length: 40 }, (_, k): [number[], bigint] => [[k, -k], big]);
    const a = sparseSeries(2, [terms, [[[1, 1], 3n]]]);
    expectProduct(a, a);
    // the coefficient of ζ₁^39 ζ₂^−39 is 40·(2^25 + 1)², odd and far above 2^53
    const sq = termsOf(multiplySeries(a, a))[0]!;
    expect([...sq.values()].some((v) => (v < 0n ? -v : v) > 1n << 52n)).toBe(true);
  });
});
