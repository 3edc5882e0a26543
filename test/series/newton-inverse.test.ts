/**
 * Newton inverses and negative powers on the modular back-end (series/residue/
 * residue-inverse.ts) against Miller's recurrence and the exact engine: 1/E_4 and
 * E_4^{−3} (dense units) and 1/η^24 = Σ p_24(n) q^{n−1}.
 */
import { describe, expect, it } from 'vitest';
import {
  rat,
  nttPrimes,
  residuesOfSeries,
  seriesOfResidues,
  inverseNewtonResidues,
  powerMillerResidues,
  powerResidues,
  powerSeries,
  isZeroSeries,
  subtractSeries,
  int,
} from '../../src/series/index.js';
import { eisensteinSource, etaPowerSource } from '../../src/forms/leaves.js';
import { readOeis } from '../helpers/oeis.js';

const P = nttPrimes().slice(0, 6);

describe('Newton inverse', () => {
  it('1/E_4 to q^300 by Newton equals Miller k = −1 and the exact inverse', () => {
    const X = rat(300);
    const e4 = eisensteinSource(4).expand(X);
    const r = residuesOfSeries(e4, P);
    const newton = inverseNewtonResidues(r, X);
    const miller = powerMillerResidues(r, -1, X);
    expect(newton.rows).toBe(301);
    newton.data.forEach((a, i) => expect(Array.from(a)).toEqual(Array.from(miller.data[i]!)));
    // exact values: E_4 vanishes at ρ = e^{2πi/3} (common practice, no source), so 1/E_4's
    // coefficients grow like e^{π√3·n}; to q^30 they stay below 2^236, and ten primes recover them
    const Y = rat(30);
    const ten = nttPrimes().slice(0, 10);
    const small = residuesOfSeries(eisensteinSource(4).expand(Y), ten);
    const exact = powerSeries(eisensteinSource(4).expand(Y), -1);
    expect(isZeroSeries(subtractSeries(seriesOfResidues(inverseNewtonResidues(small, Y), int(1)), exact))).toBe(true);
  });

  it('the dispatcher’s E_4^{−3} equals Miller’s', () => {
    const X = rat(200);
    const r = residuesOfSeries(eisensteinSource(4).expand(X), P);
    const d = powerResidues(r, -3, X);
    const m = powerMillerResidues(r, -3, X);
    d.data.forEach((a, i) => expect(Array.from(a)).toEqual(Array.from(m.data[i]!)));
  });

  it('1/η^24 by Newton gives the coefficients of 1/Δ', () => {
    // OEIS A006922: expansion of 1/η(q)^24, offset −1
    const seq = readOeis('A006922');
    expect(seq.offset).toBe(-1);
    const X = rat(30);
    const r = residuesOfSeries(etaPowerSource(24).expand(rat(33)), P.slice(0, 3));
    const inv = seriesOfResidues(inverseNewtonResidues(r, X), int(1));
    expect(inv.start).toEqual(rat(-1));
    const got = inv.slices.map((s) => ('c' in s && s.c.length > 0 ? s.c[0]!.toString() : '0'));
    expect(got).toHaveLength(32);
    expect(seq.terms.length).toBeGreaterThan(20);
    expect(got.slice(0, seq.terms.length)).toEqual(seq.terms.slice(0, 32));
  });
});
