/**
 * Identities of the odd Jacobi theta function (MATH.md §2), checked coefficient by
 * coefficient far past any bound.
 */
import { describe, expect, it } from 'vitest';
import {
  type QZSeries,
  type Slice,
  EMPTY_SLICE,
  ONE,
  int,
  rat,
  radd,
  makeSeries,
  multiplySeries,
  derivativeZeta,
  derivativeQ,
  substituteZeta,
  scaleSeries,
  shiftSeries,
  coefficientAt,
  rationalToString,
  rneg,
  rcmp,
} from '../../src/series/index.js';
import { thetaSeries } from '../../src/forms/theta.js';
import { etaPowerSeries } from '../../src/forms/eta.js';
import { seriesKey } from '../helpers/random-series.js';

/** 1 − qⁿζ^{a} (a in halves) to q-order X. */
function binomial(n: number, a: number, X: number): QZSeries {
  const slices: Slice[] = new Array<Slice>(X + 1).fill(EMPTY_SLICE);
  slices[0] = { lo: 0, c: [ONE] };
  slices[n] = n === 0 ? { lo: 0, c: [ONE] } : { lo: a, c: [int(-1)] };
  return makeSeries(rat(0), 1, ONE, slices, rat(X));
}

describe('the odd theta function', () => {
  it('Jacobi triple product equals the theta sum to q^{1/8 + 40}', () => {
    // Jacobi triple product identity (e.g. Hardy–Wright, Thm 352), as in MATH.md §2
    const N = 40;
    let p: QZSeries = makeSeries(rat(0), 1, ONE, [{ lo: -1, c: [int(-1), int(0), ONE] }, ...new Array<Slice>(N).fill(EMPTY_SLICE)], rat(N));
    for (let n = 1; n <= N; n++) {
      p = multiplySeries(p, binomial(n, 2, N));
      p = multiplySeries(p, binomial(n, -2, N));
      p = multiplySeries(p, binomial(n, 0, N));
    }
    const product = shiftSeries(p, rat(1, 8));
    expect(seriesKey(product)).toBe(seriesKey(thetaSeries(1, radd(rat(N), rat(1, 8)))));
  });

  it("D_ζϑ(τ, 0) = η³ to q^{1/8 + 2000} (Jacobi's identity)", () => {
    // Jacobi's derivative formula, Σ χ₋₄(n) n q^{n²/8} = η³ (MATH.md §2; OEIS A010816 for Π(1−qⁿ)³)
    const X = radd(rat(2000), rat(1, 8));
    const lhs = substituteZeta(derivativeZeta(thetaSeries(1, X)), 0);
    expect(seriesKey(lhs)).toBe(seriesKey(etaPowerSeries(3, X)));
  });

  it('ϑ(−z) = −ϑ(z) and ϑ(z + τ) = −q^{−1/2}ζ^{−1}ϑ(z)', () => {
    // MATH.md §2 (elliptic transformation law of ϑ; Eichler–Zagier 1985, Thm 1.4 for index ½)
    const X = radd(rat(60), rat(1, 8));
    const t = thetaSeries(1, X);
    expect(seriesKey(substituteZeta(t, -1))).toBe(seriesKey(scaleSeries(t, rat(-1))));
    // z ↦ z + τ maps q^x ζ^ℓ to q^{x+ℓ} ζ^ℓ, so the law reads c(x, ℓ) = −c(x + ℓ + ½, ℓ + 1).
    for (let i = 0; i < 30; i++) {
      const x = radd(rat(1, 8), rat(i));
      for (let h = -31; h <= 31; h += 2) {
        const l = rat(h, 2);
        const left = coefficientAt(t, x, h);
        const shiftedX = radd(radd(x, l), rat(1, 2));
        if (shiftedX.num.toString().startsWith('-') || rcmp(shiftedX, X) > 0) continue;
        const right = coefficientAt(t, shiftedX, h + 2);
        expect(rationalToString(left)).toBe(rationalToString(rneg(right)));
      }
    }
  });

  it('the heat equation D_qϑ = ½D_ζ²ϑ (MATH.md §5: Hϑ = 0 at k = ½, m = ½)', () => {
    // Follows termwise from ϑ = Σ χ₋₄(n) q^{n²/8} ζ^{n/2}: (n²/8) = ½(n/2)² (common practice, no source)
    const X = radd(rat(80), rat(1, 8));
    const t = thetaSeries(1, X);
    expect(seriesKey(derivativeQ(t))).toBe(seriesKey(scaleSeries(derivativeZeta(derivativeZeta(t)), rat(1, 2))));
  });
});
