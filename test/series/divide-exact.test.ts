/** Exact slice division: (A·T)/T = A for theta blocks T; a pole is detected. */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { divideExact, multiplySeries, truncateSeries, rat, rcmp, type QZSeries } from '../../src/series/index.js';
import { thetaSeries } from '../../src/forms/theta.js';
import { etaPowerSeries } from '../../src/forms/eta.js';
import { seriesArbitrary, seriesKey } from '../helpers/random-series.js';

describe('exact division by theta blocks', () => {
  it('(A·ϑ(az)ϑ(bz))/(ϑ(az)ϑ(bz)) = A', () => {
    fc.assert(
      fc.property(
        seriesArbitrary({ slices: 6, width: 4, density: 0.7, bits: 40 }),
        fc.integer({ min: 1, max: 4 }),
        fc.integer({ min: -3, max: 3 }).filter((b) => b !== 0),
        (A: QZSeries, a: number, b: number) => {
          const X = rat(30);
          const T = multiplySeries(thetaSeries(a, X), thetaSeries(b, X));
          const F = multiplySeries(A, T);
          const G = divideExact(F, T);
          expect(G).not.toBeNull();
          expect(rcmp(G!.exactTo, A.exactTo) <= 0).toBe(true);
          expect(seriesKey(G!)).toBe(seriesKey(truncateSeries(A, G!.exactTo)));
        },
      ),
      { seed: 11, numRuns: 60 },
    );
  });
  it('ϑ(z)/ϑ(2z) has a pole (ζ^{1/2} − ζ^{−1/2} is not divisible by ζ − ζ^{−1})', () => {
    const X = rat(10);
    expect(divideExact(thetaSeries(1, X), thetaSeries(2, X))).toBeNull();
  });
  it('η³/ϑ(z) has a pole in z (a non-theta numerator)', () => {
    const X = rat(10);
    expect(divideExact(etaPowerSeries(3, X), thetaSeries(1, X))).toBeNull();
  });
});
