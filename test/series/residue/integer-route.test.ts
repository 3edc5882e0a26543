/**
 * The integer route (integer-grid.ts, integer-multiply.ts, integer-divide.ts,
 * integer-product.ts) against the exact engine: products by both routes, powers,
 * division by units and whole theta blocks are exact whenever they are given, and
 * refused only when a bound really reaches 2^52. The refusals at the limit are tested
 * on both sides of it.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  type Int,
  type QZSeries,
  type Rational,
  type IntegerGrid,
  type IntegerProductRoute,
  type Slice,
  EMPTY_SLICE,
  JSBI,
  int,
  rat,
  radd,
  rmin,
  rcmp,
  makeSeries,
  trimSlice,
  forEachTerm,
  multiplySeries,
  powerSeries,
  truncateSeries,
  integersOfSeries,
  multiplyIntegersBy,
  powerIntegers,
  divideByUnit,
  divideResiduesByUnit,
  residuesOfSeries,
  multiplyResidues,
  productSource,
  powerSource,
  modularOf,
  expandModular,
  EXACT_LIMIT,
  sliceCountTo,
  sliceExponent,
} from '../../../src/series/index.js';
import { thetaSource, etaPowerSource } from '../../../src/forms/leaves.js';
import { seriesArb, expectSameSeries, primeSetArb, residueTerms } from './residue-helpers.js';
import { expectMajorantBounds } from './expressions.js';

const SEED = 5150;

/** The exact series an integer grid stands for. */
function seriesOfGrid(g: IntegerGrid): QZSeries {
  const slices: Slice[] = [];
  for (let i = 0; i < g.rows; i++) {
    const c: Int[] = new Array<Int>((g.width - 1) * g.zStep + 1).fill(int(0));
    for (let j = 0; j < g.width; j++) c[j * g.zStep] = JSBI.BigInt(g.data[i * g.width + j]!);
    slices.push(trimSlice(g.zLo, c));
  }
  return makeSeries(g.start, g.qDen, int(1), slices, g.exactTo);
}

function absSums(s: QZSeries): { max: bigint; sum: bigint } {
  let max = 0n;
  let sum = 0n;
  for (const sl of s.slices) {
    forEachTerm(sl, (_e, c) => {
      const a = BigInt(c.toString());
      const b = a < 0n ? -a : a;
      sum += b;
      if (b > max) max = b;
    });
  }
  return { max, sum };
}

const LIMIT = 1n << 52n;

/** The q-only series Σ c_k q^k (c_k given) as an exact series. */
function qSeries(c: readonly bigint[], start = rat(0)): QZSeries {
  const slices = c.map((x) => (x === 0n ? EMPTY_SLICE : { lo: 0, c: [JSBI.BigInt(x.toString())] }));
  return makeSeries(start, 1, int(1), slices, radd(start, rat(c.length - 1)));
}

function grid(s: QZSeries): IntegerGrid {
  const g = integersOfSeries(s);
  if (g === null) throw new Error('test series is not small integers');
  return g;
}

describe('integer grids of exact series', () => {
  it('integral series below 2^52 become grids that give the series back', () => {
    fc.assert(
      fc.property(seriesArb({ maxRows: 8, width: 5, bits: [1, 20, 51], dens: [1] }), (s) => {
        expectSameSeries(seriesOfGrid(grid(s)), s);
      }),
      { seed: SEED, numRuns: 80 },
    );
  });
  it('refuses a denominator, and a coefficient of 2^52, but takes 2^52 − 1', () => {
    expect(integersOfSeries(makeSeries(rat(0), 1, int(3), [{ lo: 0, c: [int(1)] }], rat(0)))).toBeNull();
    expect(integersOfSeries(qSeries([1n, -LIMIT]))).toBeNull();
    expect(integersOfSeries(qSeries([1n, -(LIMIT - 1n)]))).not.toBeNull();
  });
});

const ROUTES: IntegerProductRoute[] = ['sparse', 'two-primes'];

describe('integer products against the exact engine', () => {
  it('random grids, both routes and the chosen one: exact when given, refused only past the bound', () => {
    const shape = { maxRows: 8, width: 5, bits: [1, 8, 20, 30], dens: [1] };
    fc.assert(
      fc.property(seriesArb(shape), seriesArb(shape), fc.constantFrom(0, 1, 3, 50), (a, b, extra) => {
        const X = radd(radd(a.start, b.start), rat(extra));
        const order = rmin(X, rmin(radd(a.exactTo, b.start), radd(b.exactTo, a.start)));
        const want = truncateSeries(multiplySeries(a, b), order);
        const sa = absSums(a);
        const sb = absSums(b);
        const bound = sa.max * sb.sum < sa.sum * sb.max ? sa.max * sb.sum : sa.sum * sb.max;
        for (const route of [...ROUTES, null]) {
          const g = multiplyIntegersBy(route, grid(a), grid(b), X);
          if (g === null) {
            // the check rounds Σ|·| up by at most a few units in 2^52
            expect(bound * 1000001n >= LIMIT * 1000000n, `route ${route} refused a bound of ${bound}`).toBe(true);
            continue;
          }
          expect(rcmp(g.exactTo, order)).toBe(0);
          expectSameSeries(seriesOfGrid(g), want);
        }
      }),
      { seed: SEED, numRuns: 150 },
    );
  });

  it('at the limit: (2^26 − 1)(1 + q)·2^25(1 − q) is exact by both routes, 2^26(1 + q)·2^26 refused', () => {
    const a = qSeries([(1n << 26n) - 1n, (1n << 26n) - 1n, 0n]);
    const b = qSeries([1n << 25n, -(1n << 25n), 0n]);
    const top = ((1n << 26n) - 1n) << 25n;
    for (const route of ROUTES) {
      const g = multiplyIntegersBy(route, grid(a), grid(b), rat(2));
      expect(g, route).not.toBeNull();
      expectSameSeries(seriesOfGrid(g!), qSeries([top, 0n, -top]));
      expect(multiplyIntegersBy(route, grid(qSeries([1n << 26n, 1n << 26n])), grid(qSeries([1n << 26n])), rat(1)), route).toBeNull();
    }
  });

  it('long dense q-series take the two-prime route and agree with the exact engine', () => {
    const n = 3000;
    // coefficients up to 2^10 in both factors: products below 2^10·2^10·3000 < 2^52
    const a = qSeries(Array.from({ length: n }, (_, k) => BigInt(((k * 7919) % 2047) - 1023)));
    const b = qSeries(Array.from({ length: n }, (_, k) => BigInt(((k * 104729) % 2045) - 1022)));
    const X = rat(n - 1);
    const chosen = multiplyIntegersBy(null, grid(a), grid(b), X)!;
    const want = truncateSeries(multiplySeries(a, b), X);
    expectSameSeries(seriesOfGrid(chosen), want);
    expectSameSeries(seriesOfGrid(multiplyIntegersBy('two-primes', grid(a), grid(b), X)!), want);
  });

  it('powers: exact up to the a-priori bound, refused past it without a product', () => {
    fc.assert(
      fc.property(seriesArb({ maxRows: 6, width: 4, bits: [1, 4], dens: [1] }), fc.integer({ min: 1, max: 5 }), (f, k) => {
        const X = radd(f.exactTo, rat(k - 1));
        const g = powerIntegers(grid(f), k, radd(X, rat(0)));
        const { max, sum } = absSums(f);
        if (g === null) {
          expect(max * sum ** BigInt(k - 1) * 1000001n >= LIMIT * 1000000n).toBe(true);
          return;
        }
        const want = powerSeries(f, k);
        const order = rmin(X, want.exactTo);
        expectSameSeries(seriesOfGrid({ ...g, rows: sliceCountTo(g.start, g.qDen, rmin(order, g.exactTo)) }), truncateSeries(want, rmin(order, g.exactTo)));
      }),
      { seed: SEED, numRuns: 80 },
    );
  });
});

describe('division by q-only units', () => {
  it('modulo primes: the residues of the exact quotient, for integral T and sparse units', () => {
    const unitArb = fc.tuple(fc.constantFrom(1n, -1n), fc.array(fc.bigInt({ min: -9n, max: 9n }), { minLength: 0, maxLength: 12 }));
    fc.assert(
      fc.property(seriesArb({ maxRows: 10, width: 4, bits: [1, 20, 40], dens: [1], qDens: [1, 2] }), unitArb, primeSetArb(), (t, [u0, rest], primes) => {
        const T = grid(t);
        const coeffs = [u0, ...rest, ...new Array<bigint>(Math.max(0, T.rows + 1 - rest.length)).fill(0n)];
        const U = makeSeries(rat(0), T.qDen, int(1), coeffs.flatMap((c, k) => [c === 0n ? EMPTY_SLICE : { lo: 0, c: [JSBI.BigInt(c.toString())] }, ...new Array<Slice>(k === coeffs.length - 1 ? 0 : T.qDen - 1).fill(EMPTY_SLICE)]), rat(coeffs.length - 1));
        const w = divideResiduesByUnit(residuesOfSeries(truncateSeries(t, T.exactTo), primes), Float64Array.from(coeffs, Number));
        // W·U = T modulo every prime, row by row
        const back = multiplyResidues(w, residuesOfSeries(U, primes), T.exactTo);
        expect(residueTerms(back)).toEqual(residueTerms(residuesOfSeries(truncateSeries(t, T.exactTo), primes)));
      }),
      { seed: SEED, numRuns: 120 },
    );
  });

  it('T/U times U gives T back, for random integral T and units U (U(0) = ±1)', () => {
    const unitArb = fc.tuple(fc.constantFrom(1n, -1n), fc.array(fc.bigInt({ min: -3n, max: 3n }), { minLength: 0, maxLength: 12 }));
    fc.assert(
      fc.property(seriesArb({ maxRows: 10, width: 4, bits: [1, 6], dens: [1], qDens: [1, 2] }), unitArb, (t, [u0, rest]) => {
        const T = grid(t);
        // U known past T's last row
        const coeffs = [u0, ...rest, ...new Array<bigint>(Math.max(0, T.rows + 1 - rest.length)).fill(0n)];
        const u = Float64Array.from(coeffs, Number);
        const w = divideByUnit(T, u);
        if (w === null) return;
        const U = makeSeries(rat(0), T.qDen, int(1), coeffs.flatMap((c, k) => [c === 0n ? EMPTY_SLICE : { lo: 0, c: [JSBI.BigInt(c.toString())] }, ...new Array<Slice>(k === coeffs.length - 1 ? 0 : T.qDen - 1).fill(EMPTY_SLICE)]), rat(coeffs.length - 1));
        const back = truncateSeries(multiplySeries(seriesOfGrid(w), U), T.exactTo);
        expectSameSeries(back, truncateSeries(t, T.exactTo));
      }),
      { seed: SEED, numRuns: 120 },
    );
  });

  it('refuses a quotient that would pass 2^52: 2^51/(1 − 3q), and gives 2^40/(1 − 3q) to q^6', () => {
    expect(divideByUnit(grid(qSeries([1n << 51n, 0n, 0n])), Float64Array.from([1, -3, 0]))).toBeNull();
    const w = divideByUnit(grid(qSeries([1n << 40n, 0n, 0n, 0n, 0n, 0n, 0n])), Float64Array.from([1, -3, 0, 0, 0, 0, 0]))!;
    expectSameSeries(seriesOfGrid(w), qSeries(Array.from({ length: 7 }, (_, k) => (1n << 40n) * 3n ** BigInt(k))));
  });
});

/** θ(a₁z)^k₁···θ(a_nz)^k_n · η^e as a source. */
function thetaBlock(thetas: readonly (readonly [number, number])[], e: number) {
  return productSource([...thetas.map(([a, k]) => powerSource(thetaSource(a), k)), etaPowerSource(e)]);
}

describe('theta blocks by the integer route', () => {
  const blockArb = fc.tuple(
    fc.array(fc.tuple(fc.integer({ min: 1, max: 5 }), fc.integer({ min: 1, max: 3 })), { minLength: 1, maxLength: 4 }),
    fc.integer({ min: -12, max: 12 }),
    fc.integer({ min: 0, max: 14 }),
  );
  it('random θ-products over η^e: integers exact, their own majorant, the true height', () => {
    fc.assert(
      fc.property(blockArb, ([thetas, e, steps]) => {
        const src = thetaBlock(thetas, e);
        const X = radd(src.valuation, rat(steps));
        const g = modularOf(src).integers!(X);
        expect(g, 'a small theta block is integral below 2^52').not.toBeNull();
        const want = src.expand(X);
        expectSameSeries(seriesOfGrid(g!), truncateSeries(want, X));
        const m = modularOf(src).majorant(X, 1);
        const r = expandModular(src, X)!;
        expectMajorantBounds(want, m, X, r.route.heightBits, 'theta block');
        // the height is the true one: at most the bits of Σ|c| over the whole series
        const total = absSums(truncateSeries(want, X)).sum;
        expect(r.route.heightBits).toBeLessThanOrEqual(total.toString(2).length + 1);
        expectSameSeries(r.series, truncateSeries(want, X));
      }),
      { seed: SEED, numRuns: 60 },
    );
  });

  it('θ(z)³θ(2z)³θ(3z)²θ(4z)θ(5z)/η⁶ to 60 steps: the exact engine’s series, with height at most 2^5', () => {
    const src = thetaBlock([[1, 3], [2, 3], [3, 2], [4, 1], [5, 1]], -6);
    const X = radd(src.valuation, rat(60));
    const r = expandModular(src, X)!;
    expectSameSeries(r.series, truncateSeries(src.expand(X), X));
    expect(r.route.primes.length).toBe(1);
    expect(r.route.heightBits).toBeLessThanOrEqual(12);
    expect(rcmp(sliceExponent(r.series, 0), rat(1))).toBe(0);
  });

  it('blocks whose quotient passes 2^52: the exact theta part divided by the units modulo each prime', () => {
    const cases: [readonly (readonly [number, number])[], number, number][] = [
      [[[1, 2]], -24, 60],
      [[[1, 1], [3, 1]], -36, 45],
      [[[2, 3], [5, 1]], -48, 30],
    ];
    for (const [thetas, e, steps] of cases) {
      const src = thetaBlock(thetas, e);
      const X = radd(src.valuation, rat(steps));
      expect(modularOf(src).integers!(X), 'the whole quotient is past the limit').toBeNull();
      const want = truncateSeries(src.expand(X), X);
      const r = expandModular(src, X)!;
      expectSameSeries(r.series, want);
      expectMajorantBounds(want, modularOf(src).majorant(X, 1), X, r.route.heightBits, 'divided block');
    }
  });

  it('random blocks over high powers of 1/η, quotient exact or not: the exact engine’s series', () => {
    const arb = fc.tuple(
      fc.array(fc.tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 2 })), { minLength: 1, maxLength: 3 }),
      fc.integer({ min: -60, max: -12 }),
      fc.integer({ min: 5, max: 40 }),
    );
    fc.assert(
      fc.property(arb, ([thetas, e, steps]) => {
        const src = thetaBlock(thetas, e);
        const X = radd(src.valuation, rat(steps));
        expectSameSeries(expandModular(src, X)!.series, truncateSeries(src.expand(X), X));
      }),
      { seed: SEED, numRuns: 30 },
    );
  });

  it('η^e for e > 0 as integers: the exact engine’s, refused before any work for η^24 to q^20000', () => {
    for (let e = 1; e <= 24; e++) {
      const X = radd(rat(e, 24), rat(40));
      const g = modularOf(etaPowerSource(e)).integers!(X);
      expectSameSeries(seriesOfGrid(g!), truncateSeries(etaPowerSource(e).expand(X), X));
    }
    expect(modularOf(etaPowerSource(24)).integers!(rat(20000))).toBeNull();
  });
});
