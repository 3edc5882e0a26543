/**
 * η^e on the modular route: its residues against the exact engine's η-powers, its
 * majorants against the true coefficients (every block, from one coefficient per block
 * to one block for the whole expansion), its own powers, and published values through
 * expandModular.
 */
import { describe, expect, it } from 'vitest';
import {
  type Rational,
  rat,
  radd,
  rationalToString,
  nttPrimes,
  residuesOfSeries,
  expandModular,
  heightBits,
  majorantBlockLength,
} from '../../src/series/index.js';
import { etaPowerSeries } from '../../src/forms/eta.js';
import { etaPowerView } from '../../src/forms/eta-residues.js';
import { etaPowerSource } from '../../src/forms/leaves.js';
import { readOeis } from '../helpers/oeis.js';
import { qCoefficients } from '../helpers/series.js';
import { residueTerms } from '../series/residue/residue-helpers.js';
import { expectMajorantBounds } from '../series/residue/expressions.js';

const ALL_E = Array.from({ length: 49 }, (_, i) => i - 24);

/** q-order N steps past η^e's valuation, plus a fraction. */
function orderAfter(e: number, N: number, frac: Rational = rat(0)): Rational {
  return radd(radd(rat(e, 24), rat(N)), frac);
}

describe('η^e residues equal the exact η-powers', () => {
  it('e = −24 … 24 to 150 steps, on and off the grid, with two and three primes', () => {
    for (const e of ALL_E) {
      for (const [X, primes] of [
        [orderAfter(e, 150), nttPrimes().slice(0, 2)],
        [orderAfter(e, 97, rat(5, 7)), nttPrimes().slice(7, 10)],
      ] as const) {
        const r = etaPowerView(e).residues(X, primes);
        expect(rationalToString(r.exactTo)).toBe(rationalToString(X));
        expect(residueTerms(r), `η^${e} to ${rationalToString(X)}`).toEqual(residueTerms(residuesOfSeries(etaPowerSeries(e, X), primes)));
      }
    }
  });
  it('below the valuation: no rows', () => {
    const r = etaPowerView(24).residues(rat(1, 2), nttPrimes().slice(0, 1));
    expect(r.rows).toBe(0);
    expect(rationalToString(r.exactTo)).toBe('1/2');
  });
  it('its own powers: (η^e)^k is η^{ek}, negative k included', () => {
    const primes = nttPrimes().slice(0, 2);
    for (const [e, k] of [
      [3, -2],
      [-1, 24],
      [8, 3],
      [-5, -5],
    ] as const) {
      const X = orderAfter(e * k, 60);
      const own = etaPowerView(e).power!(k)!;
      expect(residueTerms(own.residues(X, primes))).toEqual(residueTerms(residuesOfSeries(etaPowerSeries(e * k, X), primes)));
    }
  });
});

describe('η^e majorants bound the true coefficients', () => {
  function check(e: number, N: number, hs: readonly number[]): void {
    const X = orderAfter(e, N);
    const s = etaPowerSeries(e, X);
    for (const h of hs) {
      const m = etaPowerView(e).majorant(X, h);
      expectMajorantBounds(s, m, X, heightBits(m), `η^${e} to ${rationalToString(X)}, h = ${h}`);
    }
  }
  it('every e in −24 … 24 to 300 steps: per coefficient, default blocks, one block', () => {
    for (const e of ALL_E) check(e, 300, [1, majorantBlockLength(orderAfter(e, 300), rat(e, 24)), 1000]);
  });
  it('selected e to 2000 steps', () => {
    for (const e of [-24, -23, -13, -1, 1, 2, 4, 5, 11, 23, 24]) check(e, 2000, [1, majorantBlockLength(orderAfter(e, 2000), rat(e, 24)), 5000]);
  });
  it('short orders (0, 1, 2 steps and fractions) where the bounds are tightest', () => {
    for (const e of ALL_E) for (const N of [0, 1, 2, 5]) for (const h of [1, 2, 3]) {
      const X = orderAfter(e, N, rat(1, 3));
      const m = etaPowerView(e).majorant(X, h);
      expectMajorantBounds(etaPowerSeries(e, X), m, X, heightBits(m), `η^${e} to ${rationalToString(X)}, h = ${h}`);
    }
  });
});

describe('η-powers through expandModular against OEIS', () => {
  it('1/η: the partition numbers (OEIS A000041)', () => {
    const seq = readOeis('A000041'); // OEIS A000041, offset 0: Π(1−qⁿ)^−1
    const n = seq.terms.length;
    const X = orderAfter(-1, n - 1);
    const got = expandModular(etaPowerSource(-1), X)!;
    expect(qCoefficients(got.series, n, rat(-1, 24))).toEqual(seq.terms);
  });
  it('η^−24 = 1/Δ (OEIS A006922)', () => {
    const seq = readOeis('A006922'); // OEIS A006922, offset −1
    const X = rat(seq.terms.length - 2);
    const got = expandModular(etaPowerSource(-24), X)!;
    expect(qCoefficients(got.series, seq.terms.length, rat(-1))).toEqual(seq.terms);
  });
  it.each([
    [2, 'A002107'], // OEIS A002107
    [3, 'A010816'], // OEIS A010816
    [4, 'A000727'], // OEIS A000727
    [8, 'A000731'], // OEIS A000731
    [12, 'A000735'], // OEIS A000735
  ])('Π(1−qⁿ)^%i against %s', (e, id) => {
    const seq = readOeis(id);
    const X = orderAfter(e, seq.terms.length - 1 + seq.offset);
    const got = expandModular(etaPowerSource(e), X)!;
    expect(qCoefficients(got.series, seq.terms.length, rat(e + 24 * seq.offset, 24))).toEqual(seq.terms);
  });
});
