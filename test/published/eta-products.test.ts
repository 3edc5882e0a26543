/**
 * η-powers against OEIS: Π(1−qⁿ)^e for e = 1…12, 24, and 1/η, 1/Δ.
 */
import { describe, expect, it } from 'vitest';
import { etaPowerSeries, eulerProductSeries, eulerCubeSeries } from '../../src/forms/eta.js';
import { powerMiller, radd, shiftSeries } from '../../src/series/index.js';
import { seriesKey } from '../helpers/random-series.js';
import { rat } from '../../src/series/index.js';
import { readOeis } from '../helpers/oeis.js';
import { qCoefficients } from '../helpers/series.js';

function checkEtaPower(e: number, id: string): void {
  const seq = readOeis(id);
  const n = seq.terms.length;
  // η^e = q^{e/24}·Π(1−qⁿ)^e: the q^{e/24 + k} coefficient is the k-th term.
  const s = etaPowerSeries(e, rat(24 * (n - 1 + seq.offset) + e, 24));
  expect(qCoefficients(s, n, rat(e + 24 * seq.offset, 24))).toEqual(seq.terms);
}

describe('eta powers', () => {
  it('Π(1−qⁿ) is the pentagonal sum', () => {
    const seq = readOeis('A010815'); // OEIS A010815
    expect(qCoefficients(eulerProductSeries(rat(seq.terms.length - 1)), seq.terms.length)).toEqual(seq.terms);
  });
  it.each([
    [2, 'A002107'], // OEIS A002107
    [3, 'A010816'], // OEIS A010816
    [4, 'A000727'], // OEIS A000727
    [5, 'A000728'], // OEIS A000728
    [6, 'A000729'], // OEIS A000729
    [8, 'A000731'], // OEIS A000731
    [10, 'A010818'], // OEIS A010818
    [12, 'A000735'], // OEIS A000735
  ])('η^%i against %s', (e, id) => checkEtaPower(e, id));

  it('1/η gives the partition numbers', () => {
    checkEtaPower(-1, 'A000041'); // OEIS A000041
  });

  it('Δ = η^24 gives Ramanujan τ (all terms)', () => {
    const seq = readOeis('A000594'); // OEIS A000594, offset 1: q·Π(1−qⁿ)^24
    const s = etaPowerSeries(24, rat(seq.terms.length));
    expect(qCoefficients(s, seq.terms.length, rat(1))).toEqual(seq.terms);
  });

  it('1/Δ = η^−24', () => {
    const seq = readOeis('A006922'); // OEIS A006922, offset −1
    const s = etaPowerSeries(-24, rat(seq.terms.length - 2));
    expect(qCoefficients(s, seq.terms.length, rat(-1))).toEqual(seq.terms);
  });

  it("Π(1−qⁿ)³ from Jacobi's identity is OEIS A010816", () => {
    const seq = readOeis('A010816'); // OEIS A010816: Σ (−1)ⁿ(2n+1) q^{n(n+1)/2}
    expect(qCoefficients(eulerCubeSeries(rat(seq.terms.length - 1)), seq.terms.length)).toEqual(seq.terms);
  });

  it('long η-powers (cubes squared through the modular route) agree with Miller\'s recurrence', () => {
    // 3000 slices take the cube-and-square route; the recurrence on the pentagonal sum is independent of it
    const X = rat(3000);
    for (const e of [4, 24]) {
      const viaCubes = etaPowerSeries(e, radd(X, rat(e, 24)));
      const viaMiller = shiftSeries(powerMiller(eulerProductSeries(X), e), rat(e, 24));
      expect(seriesKey(viaCubes)).toBe(seriesKey(viaMiller));
    }
  });
});
