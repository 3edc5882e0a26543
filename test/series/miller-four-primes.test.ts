/**
 * Miller's recurrence for four primes at once (series/residue/miller-four-primes.ts)
 * against one prime at a time and against the exact engine: Euler's series to the
 * powers 24, 7 and −6 (η^24 = Δ, OEIS A000594), and the refusal when the terms differ
 * between primes.
 */
import { describe, expect, it } from 'vitest';
import {
  JSBI,
  int,
  rat,
  makeSeries,
  nttPrimes,
  residuesOfSeries,
  powerMillerResidues,
  powerSeries,
  seriesOfResidues,
  isZeroSeries,
  subtractSeries,
  sharedTerms,
  millerFourPrimes,
  type Slice,
} from '../../src/series/index.js';
import { readOeis } from '../helpers/oeis.js';

/** Π(1 − qⁿ) to q^(rows − 1) by Euler's pentagonal theorem (common practice, no source). */
function euler(rows: number) {
  const c: Slice[] = Array.from({ length: rows }, () => ({ lo: 0, c: [] }));
  for (let k = -60; k <= 60; k++) {
    const n = (k * (3 * k - 1)) / 2;
    if (n < rows) c[n] = { lo: 0, c: [int(k % 2 === 0 ? 1 : -1)] };
  }
  return makeSeries(rat(0), 1, int(1), c, rat(rows - 1));
}

describe('Miller for four primes at once', () => {
  const P = nttPrimes().slice(0, 4);
  it.each([24, 7, -6])('Π(1 − qⁿ)^%i to q^2999 equals the one-prime passes', (k) => {
    const r = residuesOfSeries(euler(3000), P);
    const terms = sharedTerms(r.data, P, 3000);
    expect(terms).not.toBeNull();
    const four = millerFourPrimes(terms!, r.data.map((a) => a[0]!), k, 3000, P)!;
    const one = P.map((p, i) => powerMillerResidues({ ...r, primes: [p], data: [r.data[i]!] }, k, rat(2999)).data[0]!);
    four.forEach((a, q) => expect(Array.from(a)).toEqual(Array.from(one[q]!)));
  });

  it('Δ = q·Π(1 − qⁿ)^24 through it: τ(n) (OEIS A000594) and the exact power', () => {
    const r = residuesOfSeries(euler(200), P);
    const d = seriesOfResidues(powerMillerResidues(r, 24, rat(199)), int(1));
    expect(isZeroSeries(subtractSeries(d, powerSeries(euler(200), 24)))).toBe(true);
    const tau = readOeis('A000594').terms;
    d.slices.slice(0, tau.length).forEach((s, i) => expect('c' in s && s.c.length > 0 ? s.c[0]!.toString() : '0').toBe(tau[i]));
  });

  it('terms that are not the same small integers modulo each prime are refused', () => {
    const big = makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [int(1)] }, { lo: 0, c: [JSBI.exponentiate(int(2), int(40))] }], rat(1));
    expect(sharedTerms(residuesOfSeries(big, P).data, P, 2)).toBeNull();
  });
});
