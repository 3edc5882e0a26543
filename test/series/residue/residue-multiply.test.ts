/**
 * Every product route of the modular back-end against the exact engine (ARCHITECTURE.md:
 * each multiplication algorithm is tested against an independent one on seeded random
 * inputs): sparse × dense (both orders), per ζ-column, Kronecker substitution and the
 * cost model's own choice, on grids with fractional and negative starts, q-denominators
 * 1, 2, 8, half-integral ζ-exponents and numerators of every size and sign.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  type Int,
  type QZSeries,
  type Rational,
  type ResidueSeries,
  type ResidueProductRoute,
  JSBI,
  int,
  rat,
  radd,
  rmin,
  rcmp,
  multiplySeries,
  truncateSeries,
  residuesOfSeries,
  seriesOfResidues,
  multiplyResiduesBy,
  multiplyResidues,
  nttPrimes,
  makeSeries,
  trimSlice,
  type Slice,
  sharedIntegers,
  maxAbs,
  sumAbs,
} from '../../../src/series/index.js';
import {
  seriesArb,
  maxNumerator,
  primesAbove,
  residueTerms,
  expectSameSeries,
  expectWellFormed,
  primeSetArb,
  type ShapeOptions,
} from './residue-helpers.js';

const SEED = 4242;

/** The q-order a residue product can promise: min(X, X_a + start_b, X_b + start_a). */
function productOrder(a: QZSeries, b: QZSeries, X: Rational): Rational {
  return rmin(X, rmin(radd(a.exactTo, b.start), radd(b.exactTo, a.start)));
}

function routesFor(ra: ResidueSeries, rb: ResidueSeries): (ResidueProductRoute | null)[] {
  const routes: (ResidueProductRoute | null)[] = ['sparse-a', 'sparse-b', 'kronecker', null];
  if (rb.width === 1) routes.push('column-a');
  if (ra.width === 1) routes.push('column-b');
  // the integer routes when both are the same small integers modulo every prime
  const ua = sharedIntegers(ra.data, ra.primes);
  const ub = sharedIntegers(rb.data, rb.primes);
  if (ua !== null && ub !== null && maxAbs(ua) * sumAbs(ub) < 2 ** 52 && maxAbs(ub) * sumAbs(ua) < 2 ** 52) routes.push('integers-a', 'integers-b');
  return routes;
}

/** X: far past both orders, at the product's start, below it, or on/off the grid in between. */
const orderArb = fc.constantFrom<[number, number] | 'far'>('far', 'far', [0, 1], [-1, 3], [1, 3], [5, 8], [7, 2], [3, 1], [11, 4]);

function orderFor(a: QZSeries, b: QZSeries, o: [number, number] | 'far'): Rational {
  const s = radd(a.start, b.start);
  return o === 'far' ? radd(radd(a.exactTo, b.exactTo), rat(50)) : radd(s, rat(o[0], o[1]));
}

/**
 * Products by every route: exact after CRT when the primes cover the height; entrywise
 * equal residues always (also when the coefficients are far beyond the primes).
 */
function checkProducts(shapeA: ShapeOptions, shapeB: ShapeOptions, runs: number, square = false): void {
  fc.assert(
    fc.property(seriesArb(shapeA), seriesArb(shapeB), orderArb, primeSetArb(), (a0, b0, o, anyPrimes) => {
      const a = a0;
      const b = square ? a0 : b0;
      const X = orderFor(a, b, o);
      const exact = multiplySeries(a, b);
      const order = productOrder(a, b, X);
      // the exact engine knows at least as much (it uses valuations, the residues starts)
      expect(rcmp(exact.exactTo, order)).toBeGreaterThanOrEqual(0);
      const want = truncateSeries(exact, order);
      const D = JSBI.multiply(a.den, b.den);
      // numerators over D: at most max|num|·D/den of the reduced product
      const height = JSBI.divide(JSBI.multiply(maxNumerator(exact), D), exact.den);
      const primes = primesAbove(height);
      expect(primes.length).toBeLessThanOrEqual(4);
      const ra = residuesOfSeries(a, primes);
      const rb = square ? ra : residuesOfSeries(b, primes);
      for (const route of routesFor(ra, rb)) {
        const r = multiplyResiduesBy(route, ra, rb, X);
        expectWellFormed(r);
        expect(rcmp(r.exactTo, order), `route ${route}`).toBe(0);
        expectSameSeries(seriesOfResidues(r, D), want);
      }
      // residues modulo arbitrary primes (1–4, any from the table), whatever the height
      const sa = residuesOfSeries(a, anyPrimes);
      const sb = square ? sa : residuesOfSeries(b, anyPrimes);
      const wantTerms = residueTerms(residuesOfSeries(want, anyPrimes));
      for (const route of routesFor(sa, sb)) {
        expect(residueTerms(multiplyResiduesBy(route, sa, sb, X)), `route ${route}`).toEqual(wantTerms);
      }
    }),
    { seed: SEED, numRuns: runs },
  );
}

describe('residue products against the exact engine', () => {
  it('two-variable grids (ζ-columns), small and large numerators', () => {
    checkProducts({ maxRows: 7, width: 5, bits: [1, 3, 20, 40] }, { maxRows: 7, width: 5, bits: [1, 3, 20, 40] }, 120);
  });
  it('one factor q-only (one column, possibly off ζ⁰): the column routes too', () => {
    checkProducts({ maxRows: 8, width: 5, bits: [2, 21, 45] }, { maxRows: 8, width: 0, bits: [2, 21, 45], oneColumn: 3 }, 80);
    checkProducts({ maxRows: 8, width: 0, bits: [2, 30], oneColumn: -1 }, { maxRows: 8, width: 4, bits: [2, 30] }, 60);
  });
  it('both q-only, integral q-grid', () => {
    checkProducts(
      { maxRows: 12, width: 0, bits: [1, 25, 50], oneColumn: 0, qDens: [1] },
      { maxRows: 12, width: 0, bits: [1, 25, 50], oneColumn: 2, qDens: [1] },
      60,
    );
  });
  it('squares (one residue series as both factors: the shared-transform path)', () => {
    checkProducts({ maxRows: 6, width: 4, bits: [2, 30] }, { maxRows: 1, width: 0, bits: [1] }, 50, true);
  });
});

describe('residue products of long series (NTT lengths in the hundreds, deferred reductions)', () => {
  const long = (oneColumn: number | undefined, bits: number[]): fc.Arbitrary<QZSeries> =>
    fc
      .record({
        rows: fc.integer({ min: 150, max: 400 }),
        width: fc.integer({ min: 1, max: 6 }),
        bits: fc.constantFrom(...bits),
        density: fc.constantFrom(0.05, 0.4, 1),
        seed: fc.integer({ min: 1, max: 2 ** 30 }),
      })
      .map(({ rows, width, bits: b, density, seed }) => {
        let x = seed;
        const rnd = (): number => {
          x = (Math.imul(x, 1103515245) + 12345) & 0x7fffffff;
          return x / 0x80000000;
        };
        const w = oneColumn === undefined ? width : 1;
        const slices: Slice[] = [];
        for (let i = 0; i < rows; i++) {
          const c: Int[] = [];
          for (let j = 0; j < w; j++) {
            const v = rnd() < density ? Math.floor((rnd() * 2 - 1) * 2 ** b) : 0;
            c.push(int(v));
          }
          slices.push(trimSlice(oneColumn ?? -w, c));
        }
        return makeSeries(rat(1, 8), 1, int(1), slices, rat(8 * (rows - 1) + 1, 8));
      });
  it('sparse multipliers ≥ 2^21 (mulmod path) and many small ones (reduction of the double accumulator)', () => {
    fc.assert(
      fc.property(long(0, [3, 16, 26, 48]), long(undefined, [3, 16, 26, 48]), (a, b) => {
        const exact = multiplySeries(a, b);
        const primes = primesAbove(maxNumerator(exact), 2);
        const ra = residuesOfSeries(a, primes);
        const rb = residuesOfSeries(b, primes);
        const X = exact.exactTo;
        // leading zero rows: the residues promise less than the exact engine (starts, not valuations)
        const want = truncateSeries(exact, productOrder(a, b, X));
        for (const route of routesFor(ra, rb)) {
          const r = multiplyResiduesBy(route, ra, rb, X);
          expectSameSeries(seriesOfResidues(r, int(1)), want);
        }
      }),
      { seed: SEED, numRuns: 6 },
    );
  });
  it('a dense q-only series times itself with 2^26-size numerators (sums far past 2^53 before reduction)', () => {
    const rows = 600;
    const slices = Array.from({ length: rows }, (_, i) => ({ lo: 0, c: [int(((i * 7919) % 2 ** 26) - 2 ** 25 + 1)] }));
    const a = makeSeries(rat(0), 1, int(1), slices, rat(rows - 1));
    const exact = multiplySeries(a, a);
    const primes = primesAbove(maxNumerator(exact));
    expect(primes.length).toBe(3); // 600·2^50 needs more than two 30-bit primes
    const ra = residuesOfSeries(a, primes);
    for (const route of routesFor(ra, ra)) expectSameSeries(seriesOfResidues(multiplyResiduesBy(route, ra, ra, a.exactTo), int(1)), exact);
  });
});

describe('residue products: what must be refused', () => {
  const primes = nttPrimes().slice(0, 2);
  const q = residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [int(1)] }, { lo: 0, c: [int(2)] }], rat(1)), primes);
  const qz = residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: -1, c: [int(1), int(0), int(1)] }], rat(0)), primes);
  it('a column route with a two-column other factor', () => {
    expect(() => multiplyResiduesBy('column-a', q, qz, rat(5))).toThrow(RangeError);
    expect(() => multiplyResiduesBy('column-b', qz, q, rat(5))).toThrow(RangeError);
    // the q-only factor on the right side is fine
    expect(residueTerms(multiplyResiduesBy('column-a', qz, q, rat(5)))).toEqual(residueTerms(multiplyResiduesBy('kronecker', qz, q, rat(5))));
  });
  it('factors reduced modulo different prime sets', () => {
    const other = residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [int(1)] }], rat(0)), nttPrimes().slice(0, 2));
    expect(() => multiplyResidues(q, other, rat(3))).toThrow(RangeError);
  });
});

describe('Kronecker products longer than 2^20', () => {
  /** The all-ones series of `rows` rows and `width` columns, modulo the table's first prime. */
  const primes = nttPrimes().slice(0, 1);
  function ones(rows: number, width: number): ResidueSeries {
    const data = [new Int32Array(rows * width).fill(1)];
    return { primes, start: rat(0), qDen: 1, rows, exactTo: rat(rows - 1), zLo: 0, zStep: 1, width, data };
  }
  /** Entries of its square that differ from (i + 1)·(min(j, 2w − 2 − j) + 1), by route. */
  function wrongEntries(rows: number, width: number, route: ResidueProductRoute): number {
    const a = ones(rows, width);
    const r = multiplyResiduesBy(route, a, ones(rows, width), rat(rows - 1));
    expect(r.rows).toBe(rows);
    expect(r.width).toBe(2 * width - 1);
    let wrong = 0;
    const d = r.data[0]!;
    for (let i = 0; i < rows; i++) {
      for (let j = 0; j < r.width; j++) if (d[i * r.width + j] !== (i + 1) * (Math.min(j, 2 * width - 2 - j) + 1)) wrong++;
    }
    return wrong;
  }
  it('below 2^20: 500 rows × 520 columns (packed product of degree 1 037 960)', () => {
    expect(wrongEntries(500, 520, 'kronecker')).toBe(0);
  });
  // Regression: 512 rows × 520 columns pack to a product of
  // degree 2·(511·1039 + 519) = 1 062 396 > 2^20, so nttMultiply takes a transform of
  // length 2^21; the first prime p = 1005·2^20 + 1 has no 2^21-th root of unity, the
  // twiddles are computed with the non-integral exponent (p − 1)/2^21, and 14 321
  // entries come out wrong. nttMultiply does not check the length (the exact engine's
  // polyMulMultiModular returns null above 2^20), and the cost model picks this route by
  // itself for such shapes.
  it("beyond 2^20: 512 rows × 520 columns", () => {
    expect((nttPrimes()[0]!.p - 1) / 2 ** 20 % 2).toBe(1);
    expect(wrongEntries(512, 520, 'kronecker')).toBe(0);
  });
});
