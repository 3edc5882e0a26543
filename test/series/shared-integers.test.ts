/**
 * The integer route of residue products (series/residue/shared-integers.ts): theta
 * products once for all primes equal the per-prime routes and the exact product, and
 * the route is refused when the residues are not one small integer modulo every prime
 * or the product could leave the exact range of doubles.
 */
import { describe, expect, it } from 'vitest';
import {
  JSBI,
  int,
  rat,
  makeSeries,
  nttPrimes,
  residuesOfSeries,
  seriesOfResidues,
  multiplyResiduesBy,
  multiplySeries,
  truncateSeries,
  isZeroSeries,
  subtractSeries,
  sharedIntegers,
} from '../../src/series/index.js';
import { thetaSeries } from '../../src/forms/theta.js';

describe('products once for all primes', () => {
  const P = nttPrimes().slice(0, 3);
  const X = rat(40);
  const a = multiplySeries(thetaSeries(1, X), multiplySeries(thetaSeries(1, X), thetaSeries(1, X)));
  const b = multiplySeries(thetaSeries(2, X), thetaSeries(3, X));
  const ra = residuesOfSeries(truncateSeries(a, X), P);
  const rb = residuesOfSeries(truncateSeries(b, X), P);

  it('ϑ(z)³ · ϑ(2z)ϑ(3z) by the integer routes equals Kronecker and the exact product', () => {
    const k = multiplyResiduesBy('kronecker', ra, rb, X);
    for (const route of ['integers-a', 'integers-b'] as const) {
      const r = multiplyResiduesBy(route, ra, rb, X);
      r.data.forEach((d, i) => expect(Array.from(d)).toEqual(Array.from(k.data[i]!)));
    }
    const exact = truncateSeries(multiplySeries(a, b), X);
    expect(isZeroSeries(subtractSeries(seriesOfResidues(multiplyResiduesBy('integers-a', ra, rb, X), int(1)), exact))).toBe(true);
  });

  it('residues that are not one small integer modulo every prime have no shared integers', () => {
    const big = makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [JSBI.exponentiate(int(2), int(31))] }], rat(0));
    expect(sharedIntegers(residuesOfSeries(big, P).data, P)).toBeNull();
    expect(sharedIntegers(ra.data, P)).not.toBeNull();
  });

  it('the route is refused when the product could pass 2^52', () => {
    const wide = makeSeries(rat(0), 1, int(1), [{ lo: 0, c: [int(2 ** 28), int(2 ** 28)] }], rat(0));
    const r = residuesOfSeries(wide, P);
    expect(() => multiplyResiduesBy('integers-a', r, r, rat(0))).toThrow(RangeError);
  });
});
