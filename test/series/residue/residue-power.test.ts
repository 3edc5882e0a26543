/**
 * Powers of residue series against the exact engine's `powerSeries`: Miller's recurrence
 * (one column with a unit lead, negative exponents included), repeated squaring, the
 * transform route and the dispatcher, on random grids.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  type QZSeries,
  type Rational,
  type ResidueSeries,
  JSBI,
  int,
  rat,
  radd,
  rmul,
  rmin,
  rcmp,
  powerSeries,
  truncateSeries,
  residuesOfSeries,
  seriesOfResidues,
  powerResidues,
  powerMillerResidues,
  powerSquaringResidues,
  powerTransformResidues,
  powerEvaluatedResidues,
  powerRepeatedResidues,
  millerApplies,
  nttPrimes,
  makeSeries,
  rationalToString,
  multiplyResidues,
  hasMonomialLead,
  sliceIsZero,
  sliceCountTo,
  inverseNewtonResidues,
  type NttPrime,
} from '../../../src/series/index.js';
import { seriesArb, maxNumerator, primesAbove, residueTerms, expectSameSeries, expectWellFormed, primeSetArb } from './residue-helpers.js';

const SEED = 9001;

/** f^k can be promised to min(X, X_f + (k − 1)·start_f). */
function powerOrder(f: QZSeries, k: number, X: Rational): Rational {
  return rmin(X, radd(f.exactTo, rmul(f.start, rat(k - 1))));
}

const orderArb = fc.constantFrom<'far' | [number, number]>('far', 'far', [0, 1], [1, 3], [5, 2], [-1, 8]);

function orderFor(f: QZSeries, k: number, o: 'far' | [number, number]): Rational {
  const s = rmul(f.start, rat(k));
  return o === 'far' ? radd(radd(f.exactTo, rmul(f.exactTo, rat(Math.abs(k)))), rat(40)) : radd(s, rat(o[0], o[1]));
}

type Route = (f: ResidueSeries, k: number, X: Rational) => ResidueSeries;

/** The exact power reconstructed from each route, and the residues modulo arbitrary primes. */
function checkPower(f: QZSeries, k: number, X: Rational, anyPrimes: readonly NttPrime[], routes: Route[]): void {
  const exact = powerSeries(f, k);
  const order = powerOrder(f, k, X);
  expect(rcmp(exact.exactTo, order)).toBeGreaterThanOrEqual(0);
  const D = JSBI.exponentiate(f.den, int(Math.abs(k)));
  const height = JSBI.divide(JSBI.multiply(maxNumerator(exact), D), exact.den);
  const primes = primesAbove(height);
  const r0 = residuesOfSeries(f, primes);
  const s0 = residuesOfSeries(f, anyPrimes);
  for (const route of routes) {
    const r = route(r0, k, X);
    expectWellFormed(r);
    if (k === 1) {
      // f¹ is f cut to X's rows; its order may stay past X up to the next grid point (see the report)
      expect(r.rows).toBe(sliceCountTo(f.start, f.qDen, order));
      expect(rcmp(r.exactTo, order)).toBeGreaterThanOrEqual(0);
    } else expect(rationalToString(r.exactTo)).toBe(rationalToString(order));
    const want = truncateSeries(exact, rmin(r.exactTo, exact.exactTo));
    expectSameSeries(seriesOfResidues(r, D), want);
    const s = route(s0, k, X);
    expect(rationalToString(s.exactTo)).toBe(rationalToString(r.exactTo));
    expect(residueTerms(s)).toEqual(residueTerms(residuesOfSeries(want, anyPrimes)));
  }
}

describe("Miller's recurrence on residues", () => {
  it('one column with lead ±1: every exponent from −4 to 6', () => {
    const base = seriesArb({ maxRows: 9, width: 0, bits: [1, 4, 12], oneColumn: 1, unitLead: true });
    fc.assert(
      fc.property(base, fc.integer({ min: -4, max: 6 }).filter((k) => k !== 0), orderArb, primeSetArb(), (f, k, o, anyPrimes) => {
        const X = orderFor(f, k, o);
        const r = residuesOfSeries(f, anyPrimes);
        expect(millerApplies(r)).toBe(true);
        checkPower(f, k, X, anyPrimes, [powerMillerResidues, powerResidues]);
      }),
      { seed: SEED, numRuns: 120 },
    );
  });
  it('one column with a non-unit lead and a denominator (rational powers, residues only)', () => {
    // lead 3/2 or −5/12 …: the exact power has denominators; residues must still agree modulo p
    const base = seriesArb({ maxRows: 7, width: 0, bits: [2, 10], oneColumn: 0, dens: [1, 2, 12] }).filter(
      (f) => hasMonomialLead(f) && !sliceIsZero(f.slices[0]!),
    );
    fc.assert(
      fc.property(base, fc.integer({ min: -3, max: 4 }).filter((k) => k !== 0), primeSetArb(3), (f, k, primes) => {
        const X = radd(rmul(f.start, rat(k)), rat(6));
        const want = truncateSeries(powerSeries(f, k), powerOrder(f, k, X));
        const r = residuesOfSeries(f, primes);
        expect(millerApplies(r)).toBe(true);
        expect(residueTerms(powerMillerResidues(r, k, X))).toEqual(residueTerms(residuesOfSeries(want, primes)));
        expect(residueTerms(powerResidues(r, k, X))).toEqual(residueTerms(residuesOfSeries(want, primes)));
      }),
      { seed: SEED, numRuns: 80 },
    );
  });
  it('does not apply to two columns or to a lead that vanishes modulo a prime', () => {
    const primes = nttPrimes().slice(0, 2);
    const two = residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: -1, c: [int(1), int(0), int(1)] }], rat(0)), primes);
    expect(millerApplies(two)).toBe(false);
    const p1 = primes[1]!.p;
    const lead = residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [int(p1)] }, { lo: 0, c: [int(1)] }], rat(1)), primes);
    expect(millerApplies(lead)).toBe(false);
    // … so a negative power of it is refused rather than computed wrongly
    expect(() => powerResidues(lead, -1, rat(1))).toThrow(RangeError);
  });
  it('refuses k = 0 (the constant 1 is no residue power)', () => {
    const r = residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [int(1)] }], rat(0)), nttPrimes().slice(0, 1));
    expect(() => powerResidues(r, 0, rat(0))).toThrow(RangeError);
  });
});

describe('squaring, transform and dispatcher routes', () => {
  it('two-variable bases, k = 1…5, X on and off the grid', () => {
    const base = seriesArb({ maxRows: 6, width: 3, bits: [1, 3, 12] });
    fc.assert(
      fc.property(base, fc.integer({ min: 1, max: 5 }), orderArb, primeSetArb(), (f, k, o, anyPrimes) => {
        const X = orderFor(f, k, o);
        const routes: Route[] = [powerSquaringResidues];
        if (k >= 2) routes.push(powerTransformResidues, powerRepeatedResidues, powerEvaluatedResidues, powerResidues);
        checkPower(f, k, X, anyPrimes, routes);
      }),
      { seed: SEED, numRuns: 100 },
    );
  });
  it('q-only bases with leading zero rows (no Miller), k = 2…7', () => {
    const base = seriesArb({ maxRows: 10, width: 0, bits: [1, 8, 30], oneColumn: -2 });
    fc.assert(
      fc.property(base, fc.integer({ min: 2, max: 7 }), orderArb, primeSetArb(), (f, k, o, anyPrimes) => {
        checkPower(f, k, orderFor(f, k, o), anyPrimes, [powerSquaringResidues, powerTransformResidues, powerRepeatedResidues, powerEvaluatedResidues, powerResidues]);
      }),
      { seed: SEED, numRuns: 60 },
    );
  });
  it('k = 1 returns the base cut to X', () => {
    const f = makeSeries(rat(1, 8), 1, int(1), [{ lo: 0, c: [int(2)] }, { lo: 0, c: [int(-3)] }, { lo: 1, c: [int(5)] }], rat(17, 8));
    const r = residuesOfSeries(f, nttPrimes().slice(0, 1));
    const p = powerResidues(r, 1, rat(9, 8));
    expect(p.rows).toBe(2);
    expect(residueTerms(p)).toEqual(residueTerms(residuesOfSeries(truncateSeries(f, rat(9, 8)), r.primes)));
  });
});

describe('powers by evaluation in ζ', () => {
  // (ζ − 2 + ζ⁻¹) vanishes at ζ = 1: that point's q-series starts a row later, another
  // point's (a row of zeros first) later still
  const phiLike = makeSeries(
    rat(0),
    1,
    int(1),
    [
      { lo: -2, c: [int(1), int(0), int(-2), int(0), int(1)] },
      { lo: -4, c: [int(-2), int(0), int(8), int(0), int(-12), int(0), int(8), int(0), int(-2)] },
      { lo: -4, c: [int(1), int(0), int(0), int(0), int(3)] },
      { lo: 0, c: [int(5)] },
    ],
    rat(3),
  );
  const lateStart = makeSeries(rat(-1, 2), 2, int(1), [{ lo: 0, c: [] }, { lo: 0, c: [] }, { lo: -1, c: [int(1), int(1)] }, { lo: -3, c: [int(7), int(0), int(0), int(0), int(0), int(0), int(-1)] }], rat(1));
  it('bases whose lowest row vanishes at some roots of unity, k = 2…7: the exact power', () => {
    for (const f of [phiLike, lateStart]) {
      for (let k = 2; k <= 7; k++) {
        checkPower(f, k, radd(rmul(f.start, rat(k)), rat(3)), nttPrimes().slice(2, 5), [powerEvaluatedResidues, powerTransformResidues]);
      }
    }
  });
  it('wide bases with dozens of rows (the route the dispatcher takes for high powers of weak forms)', () => {
    const base = seriesArb({ maxRows: 30, width: 12, bits: [1, 6], dens: [1] });
    fc.assert(
      fc.property(base, fc.integer({ min: 2, max: 8 }), primeSetArb(), (f, k, anyPrimes) => {
        checkPower(f, k, radd(rmul(f.start, rat(k)), rat(12)), anyPrimes, [powerEvaluatedResidues, powerResidues]);
      }),
      { seed: SEED, numRuns: 25 },
    );
  });
});

describe('long powers: Miller against the transform and squaring routes', () => {
  it('a sparse q-only base of 1500 rows to the powers −7, 5 and 24', () => {
    // Π(1 − qⁿ) written out by Euler's pentagonal theorem (common practice, no source needed:
    // here it is only a sparse unit-lead base; the routes are compared with each other)
    const rows = 1500;
    const c = new Array<number>(rows).fill(0);
    for (let k = -40; k <= 40; k++) {
      const n = (k * (3 * k - 1)) / 2;
      if (n < rows) c[n] = k % 2 === 0 ? 1 : -1;
    }
    const f = makeSeries(rat(0), 1, int(1), c.map((v) => (v === 0 ? { lo: 0, c: [] } : { lo: 0, c: [int(v)] })), rat(rows - 1));
    const primes = nttPrimes().slice(3, 6);
    const r = residuesOfSeries(f, primes);
    for (const k of [5, 24]) {
      const X = rat(rows - 1);
      const m = residueTerms(powerMillerResidues(r, k, X));
      expect(residueTerms(powerTransformResidues(r, k, X))).toEqual(m);
      expect(residueTerms(powerSquaringResidues(r, k, X))).toEqual(m);
      expect(residueTerms(powerRepeatedResidues(r, k, X))).toEqual(m);
      expect(residueTerms(powerResidues(r, k, X))).toEqual(m);
    }
    // f^−7 · f^7 = 1 to the order both know
    const inv = powerMillerResidues(r, -7, rat(rows - 1));
    const pos = powerTransformResidues(r, 7, rat(rows - 1));
    expect(residueTerms(multiplyResidues(inv, pos, rat(rows - 1)))).toEqual(['0 0 1,1,1']);
    expect(pos.rows).toBe(rows);
  });
});

describe('Newton inverses of q-only units', () => {
  it('agree with the exact inverse (orders included) and with Miller at k = −1', () => {
    const base = seriesArb({ maxRows: 12, width: 0, bits: [1, 6, 20], oneColumn: 2, unitLead: true });
    fc.assert(
      fc.property(base, orderArb, primeSetArb(), (f, o, primes) => {
        const X = orderFor(f, -1, o);
        const want = powerSeries(f, -1);
        const r = residuesOfSeries(f, primes);
        const g = inverseNewtonResidues(r, X);
        expectWellFormed(g);
        const order = rmin(X, radd(f.exactTo, rmul(f.start, rat(-2))));
        expect(rationalToString(g.exactTo)).toBe(rationalToString(order));
        expect(residueTerms(g)).toEqual(residueTerms(residuesOfSeries(truncateSeries(want, order), primes)));
        expect(residueTerms(g)).toEqual(residueTerms(powerMillerResidues(r, -1, X)));
      }),
      { seed: SEED, numRuns: 80 },
    );
  });
  it('dense units of 800 rows to negative powers: the dispatcher (Newton or Miller) against Miller', () => {
    const rows = 800;
    const slices = Array.from({ length: rows }, (_, i) => ({ lo: 0, c: [int(i === 0 ? 1 : ((i * 2654435761) % 2001) - 1000)] }));
    const f = makeSeries(rat(3, 8), 1, int(1), slices, rat(8 * rows - 5, 8));
    const r = residuesOfSeries(f, nttPrimes().slice(0, 2));
    for (const k of [-1, -2, -5]) {
      const X = radd(rmul(f.start, rat(k)), rat(rows - 1));
      expect(residueTerms(powerResidues(r, k, X))).toEqual(residueTerms(powerMillerResidues(r, k, X)));
    }
    expect(() => inverseNewtonResidues(residuesOfSeries(makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [] }, { lo: 0, c: [int(1)] }], rat(1)), r.primes), rat(1))).toThrow(RangeError);
  });
});

describe('powers of a series starting below q⁰', () => {
  // Regression: powerSquaringResidues caps each partial product
  // at X, but the factors still to come have negative valuation, so f³ is cut too early
  // and f⁷ = f³·f⁴ ends at −10 instead of the −6 promised by f's own order.
  it('repeated squaring reaches min(X, X_f + (k − 1)·start) (f = q⁻¹ + 1 to q⁰, k = 7, X = −6)', () => {
    const f = makeSeries(rat(-1), 1, int(1), [{ lo: 0, c: [int(1)] }, { lo: 0, c: [int(1)] }], rat(0));
    const r = residuesOfSeries(f, nttPrimes().slice(0, 1));
    const p = powerSquaringResidues(r, 7, rat(-6));
    expect(rationalToString(p.exactTo)).toBe('-6');
  });
  it('the transform route reaches it', () => {
    const f = makeSeries(rat(-1), 1, int(1), [{ lo: 0, c: [int(1)] }, { lo: 0, c: [int(1)] }], rat(0));
    const r = residuesOfSeries(f, nttPrimes().slice(0, 1));
    const p = powerTransformResidues(r, 7, rat(-6));
    expect(rationalToString(p.exactTo)).toBe('-6');
    // (1 + q)^7 q^−7 to q^−6: 1, 7 (binomial coefficients, common practice, no source)
    expect(residueTerms(p)).toEqual(['-6 0 7', '-7 0 1']);
  });
});
