/** Eisenstein series against OEIS, and E_4³ − E_6² = 1728Δ far past any bound. */
import { describe, expect, it } from 'vitest';
import { eisensteinSeries } from '../../src/forms/eisenstein.js';
import { etaPowerSeries } from '../../src/forms/eta.js';
import {
  rat,
  multiplySeries,
  subtractSeries,
  scaleSeries,
  powerSeries,
  truncateSeries,
} from '../../src/series/index.js';
import { readOeis } from '../helpers/oeis.js';
import { qCoefficients } from '../helpers/series.js';
import { seriesKey } from '../helpers/random-series.js';

describe('Eisenstein series', () => {
  it.each([
    [2, 'A006352', 1], // OEIS A006352: E_2 = 1 − 24Σσ(n)qⁿ
    [4, 'A004009', 1], // OEIS A004009
    [6, 'A013973', 1], // OEIS A013973
    [8, 'A008410', 1], // OEIS A008410
    [10, 'A013974', 1], // OEIS A013974
    [12, 'A029828', 691], // OEIS A029828 is 691·E_12
    [14, 'A058550', 1], // OEIS A058550
  ])('E_%i against %s', (k, id, scale) => {
    const seq = readOeis(id);
    const s = scaleSeries(eisensteinSeries(k, rat(seq.terms.length - 1)), rat(scale));
    expect(qCoefficients(s, seq.terms.length, rat(0))).toEqual(seq.terms);
  });

  it('E_4³ − E_6² = 1728Δ to q^1000, Δ computed as η^24', () => {
    // Textbook identity (e.g. Serre, *A Course in Arithmetic*, VII §4.4); OEIS A000594 for its first terms.
    const X = rat(1000);
    const lhs = subtractSeries(powerSeries(eisensteinSeries(4, X), 3), multiplySeries(eisensteinSeries(6, X), eisensteinSeries(6, X)));
    const rhs = scaleSeries(etaPowerSeries(24, X), rat(1728));
    expect(seriesKey(truncateSeries(lhs, X))).toBe(seriesKey(rhs));
  });
});
