/**
 * E_k on the modular route: residues against the exact Eisenstein series, majorants
 * against the true coefficients up to q^500, the denominator 691 of E_12 kept out of
 * the primes, and published values through expandModular.
 */
import { describe, expect, it } from 'vitest';
import {
  type Rational,
  JSBI,
  int,
  rat,
  radd,
  rationalToString,
  nttPrimes,
  residuesOfSeries,
  expandModular,
  modularResidues,
  heightBits,
  majorantBlockLength,
  scaledSource,
} from '../../src/series/index.js';
import { eisensteinSeries } from '../../src/forms/eisenstein.js';
import { eisensteinView } from '../../src/forms/eisenstein-residues.js';
import { eisensteinSource } from '../../src/forms/leaves.js';
import { readOeis } from '../helpers/oeis.js';
import { qCoefficients } from '../helpers/series.js';
import { residueTerms } from '../series/residue/residue-helpers.js';
import { expectMajorantBounds } from '../series/residue/expressions.js';

const WEIGHTS = [2, 4, 6, 8, 10, 12, 14];

describe('E_k residues equal the exact series', () => {
  it.each(WEIGHTS)('E_%i to q^300, to q^{77/2}, below q^0', (k) => {
    for (const [X, primes] of [
      [rat(300), nttPrimes().slice(0, 2)],
      [rat(77, 2), nttPrimes().slice(20, 23)],
    ] as [Rational, ReturnType<typeof nttPrimes>][]) {
      const r = eisensteinView(k).residues(X, primes);
      expect(rationalToString(r.exactTo)).toBe(rationalToString(X));
      expect(residueTerms(r)).toEqual(residueTerms(residuesOfSeries(eisensteinSeries(k, X), primes)));
    }
    expect(eisensteinView(k).residues(rat(-1, 3), nttPrimes().slice(0, 1)).rows).toBe(0);
  });
});

describe('E_k majorants bound the true coefficients', () => {
  it.each(WEIGHTS)('E_%i to q^500: per coefficient, default blocks, blocks of 7, one block', (k) => {
    const X = rat(500);
    const s = eisensteinSeries(k, X);
    for (const h of [1, majorantBlockLength(X, rat(0)), 7, 1000]) {
      const m = eisensteinView(k).majorant(X, h);
      expectMajorantBounds(s, m, X, heightBits(m), `E_${k}, h = ${h}`);
    }
  });
  it.each(WEIGHTS)('E_%i at short orders, on and off the grid', (k) => {
    for (const X of [rat(0), rat(1, 2), rat(1), rat(2), rat(7, 3), rat(12)]) {
      for (const h of [1, 2, 5]) {
        const m = eisensteinView(k).majorant(X, h);
        expectMajorantBounds(eisensteinSeries(k, X), m, X, heightBits(m), `E_${k} to ${rationalToString(X)}, h = ${h}`);
      }
    }
  });
});

describe('E_k through expandModular against OEIS', () => {
  it.each([
    [2, 'A006352', 1], // OEIS A006352: E_2
    [4, 'A004009', 1], // OEIS A004009: E_4
    [6, 'A013973', 1], // OEIS A013973: E_6
    [8, 'A008410', 1], // OEIS A008410: E_8
    [10, 'A013974', 1], // OEIS A013974: E_10
    [12, 'A029828', 691], // OEIS A029828: 691·E_12
    [14, 'A058550', 1], // OEIS A058550: E_14
  ])('E_%i against %s (scaled by %i)', (k, id, scale) => {
    const seq = readOeis(id);
    const X = rat(seq.terms.length - 1);
    const src = scale === 1 ? eisensteinSource(k) : scaledSource(eisensteinSource(k), rat(scale));
    const got = expandModular(src, X)!;
    expect(got).not.toBeNull();
    expect(qCoefficients(got.series, seq.terms.length)).toEqual(seq.terms);
  });
  it('E_12 to q^200: primes avoid 691, and the constant term is exactly 1', () => {
    const m = modularResidues(eisensteinSource(12), rat(200))!;
    for (const p of m.route.primes) expect(p % 691).not.toBe(0);
    expect(JSBI.equal(JSBI.remainder(m.majorant.avoid, int(691)), int(0))).toBe(true);
    const got = expandModular(eisensteinSource(12), rat(200))!;
    expect(got.series.den.toString()).toBe('691');
    expect(qCoefficients(got.series, 2)).toEqual(['1', '65520/691']); // E_12 = 1 + (65520/691)q + … (OEIS A029828 / 691)
    // and the whole series against the exact engine
    const want = eisensteinSeries(12, rat(200));
    expect(qCoefficients(got.series, 201)).toEqual(qCoefficients(want, 201));
  });
  it('orders between grid points: E_4 to q^{10/3}', () => {
    const got = expandModular(eisensteinSource(4), radd(rat(3), rat(1, 3)))!;
    expect(rationalToString(got.series.exactTo)).toBe('10/3');
    expect(qCoefficients(got.series, 4)).toEqual(['1', '240', '2160', '6720']); // OEIS A004009
  });
});
