/**
 * Sums of powers combined in the transform domain (residue-spectrum.ts) against the exact
 * engine: random q-only bases, powers 2…5, rational coefficients, spectra on one grid
 * and on different grids, and E_4³ − E_6² = 1728Δ (Serre, *A course in arithmetic*,
 * VII.4.4) through whole sources, where the fused route is the one taken.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  JSBI,
  int,
  rat,
  radd,
  rmin,
  rmul,
  powerSeries,
  linearCombination,
  truncateSeries,
  residuesOfSeries,
  seriesOfResidues,
  powerSpectrum,
  sumOfSpectra,
  sameSpectrumGrid,
  combineResidues,
  powerSource,
  sumSource,
  expandModular,
  scaleSeries,
  nttPrimes,
} from '../../../src/series/index.js';
import { eisensteinSource, etaPowerSource } from '../../../src/forms/leaves.js';
import { seriesArb, expectSameSeries, maxNumerator, primesAbove } from './residue-helpers.js';

const SEED = 7117;

describe('sums of powers in the transform domain', () => {
  it('Σ cᵢ fᵢ^kᵢ from spectra equals the exact combination, one grid or several', () => {
    const base = seriesArb({ maxRows: 12, width: 0, bits: [1, 10], oneColumn: 0, qDens: [1], dens: [1] });
    const term = fc.tuple(base, fc.integer({ min: 2, max: 5 }), fc.integer({ min: -7, max: 7 }), fc.constantFrom(1, 2, 3));
    fc.assert(
      fc.property(fc.array(term, { minLength: 1, maxLength: 4 }), ([f0, ...rest]) => {
        // every term on f0's start so that several spectra can share a grid
        const terms = [f0, ...rest];
        const exactPowers = terms.map(([f, k]) => powerSeries(f, k));
        const combo = linearCombination(exactPowers.map((s, i) => ({ series: s, coefficient: rat(terms[i]![2], terms[i]![3]) })));
        let height = maxNumerator(combo);
        for (const s of exactPowers) height = JSBI.greaterThan(maxNumerator(s), height) ? maxNumerator(s) : height;
        const primes = primesAbove(JSBI.multiply(height, int(36)));
        const X = terms.map(([f, k]) => radd(f.exactTo, rmul(f.start, rat(k - 1)))).reduce((a, b) => rmin(a, b));
        const spectra = terms.map(([f, k]) => powerSpectrum(residuesOfSeries(f, primes), k, X, true)!);
        const group = spectra.map((s, i) => ({ spectrum: s, coefficient: rat(terms[i]![2], terms[i]![3]) }));
        const one = group.filter((g) => sameSpectrumGrid(g.spectrum, group[0]!.spectrum));
        const others = group.filter((g) => !sameSpectrumGrid(g.spectrum, group[0]!.spectrum));
        const r = combineResidues(
          [
            { series: sumOfSpectra(one), coefficient: rat(1) },
            ...others.map((g) => ({ series: sumOfSpectra([{ spectrum: g.spectrum, coefficient: rat(1) }]), coefficient: g.coefficient })),
          ],
          primes,
        );
        const want = truncateSeries(combo, r.exactTo);
        expectSameSeries(seriesOfResidues(r, int(36)), want);
      }),
      { seed: SEED, numRuns: 80 },
    );
  });

  it('E_4³ − E_6² to q^600 is 1728Δ, by the fused route', () => {
    const src = sumSource([
      { source: powerSource(eisensteinSource(4), 3), coefficient: rat(1) },
      { source: powerSource(eisensteinSource(6), 2), coefficient: rat(-1) },
    ]);
    const X = rat(600);
    const m = expandModular(src, X)!;
    expectSameSeries(m.series, scaleSeries(etaPowerSource(24).expand(X), rat(1728)));
    // the fused route applies to both powers here
    const primes = nttPrimes().slice(0, 2);
    const e4 = powerSpectrum(residuesOfSeries(eisensteinSource(4).expand(rat(600)), primes), 3, X);
    const e6 = powerSpectrum(residuesOfSeries(eisensteinSource(6).expand(rat(600)), primes), 2, X);
    expect(e4 !== null && e6 !== null && sameSpectrumGrid(e4, e6)).toBe(true);
  });

  it('a sum whose powers need different transform lengths: E_4⁵ + 3·E_6² − E_4·E_6 to q^700', () => {
    const src = sumSource([
      { source: powerSource(eisensteinSource(4), 5), coefficient: rat(1) },
      { source: powerSource(eisensteinSource(6), 2), coefficient: rat(3) },
      { source: powerSource(eisensteinSource(4), 1), coefficient: rat(-1, 2) },
    ]);
    const X = rat(700);
    expectSameSeries(expandModular(src, X)!.series, truncateSeries(src.expand(X), X));
  });
});

