/** Miller's recurrence against repeated multiplication; inverses of units. */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  powerMiller,
  powerSeries,
  multiplySeries,
  mulSchoolbook,
  constantSeries,
  hasMonomialLead,
  truncateSeries,
  rat,
  rcmp,
  type QZSeries,
} from '../../src/series/index.js';
import { seriesArbitrary, seriesKey } from '../helpers/random-series.js';

const SEED = 7;
const base = seriesArbitrary({ slices: 7, width: 3, density: 0.8, bits: 12 }).filter(hasMonomialLead);

function repeated(f: QZSeries, k: number): QZSeries {
  let acc = f;
  for (let i = 1; i < k; i++) acc = mulSchoolbook(acc, f);
  return acc;
}

describe('powers', () => {
  it("Miller's recurrence equals repeated multiplication (integral and rational cases)", () => {
    fc.assert(
      fc.property(base, fc.integer({ min: 2, max: 5 }), (f, k) => {
        const m = powerMiller(f, k);
        const r = repeated(f, k);
        expect(rcmp(m.exactTo, r.exactTo)).toBe(0);
        expect(seriesKey(m)).toBe(seriesKey(r));
      }),
      { seed: SEED, numRuns: 120 },
    );
  });
  it('f^{−k}·f^k = 1 to the q-order both know', () => {
    fc.assert(
      fc.property(base, fc.integer({ min: 1, max: 3 }), (f, k) => {
        const inv = powerSeries(f, -k);
        const prod = multiplySeries(inv, powerSeries(f, k));
        expect(seriesKey(prod)).toBe(seriesKey(truncateSeries(constantSeries(rat(1), prod.exactTo), prod.exactTo)));
      }),
      { seed: SEED, numRuns: 80 },
    );
  });
});
