/**
 * Identities between the weak generators and Jacobi–Eisenstein series, checked
 * coefficient by coefficient well past any Sturm-type bound. They also confirm the
 * "(memory)" values of MATH.md §2 (E_{4,1}, E_{6,1}, φ_{0,1}'s q¹ slice, the φ_{−1,2}²
 * relation) by independent constructions.
 */
import { describe, expect, it } from 'vitest';
import {
  type QZSeries,
  type SeriesSource,
  rat,
  linearCombination,
  multiplySeries,
  powerSeries,
  truncateSeries,
  scaleSeries,
  rcmp,
  radd,
  constantSeries,
  makeSeries,
  shiftSeries,
  trimSlice,
  int,
  JSBI,
  ONE,
  EMPTY_SLICE,
  type Slice,
  type Int,
} from '../../src/series/index.js';
import { phiMinus2Source } from '../../src/forms/phi-m2-1.js';
import { phi0Source } from '../../src/forms/phi-0-1.js';
import { phiMinus1Index2Source } from '../../src/forms/phi-m1-2.js';
import { phi0Index3HalfSource } from '../../src/forms/phi-0-3half.js';
import { phi10Source } from '../../src/forms/phi-10-1.js';
import { phi12Source } from '../../src/forms/phi-12-1.js';
import { wpNumeratorSource } from '../../src/forms/wp.js';
import { eisensteinSource, etaPowerSource, jacobiEisensteinSource, thetaSource } from '../../src/forms/leaves.js';
import { seriesKey } from '../helpers/random-series.js';

const X = rat(40);
const at = (s: SeriesSource): QZSeries => s.expand(X);
const same = (a: QZSeries, b: QZSeries): void => {
  const to = rcmp(a.exactTo, b.exactTo) <= 0 ? a.exactTo : b.exactTo;
  expect(rcmp(to, rat(20))).toBeGreaterThanOrEqual(0);
  expect(seriesKey(truncateSeries(a, to))).toBe(seriesKey(truncateSeries(b, to)));
};

describe('Eichler–Zagier 1985, Thm 9.3 (and §3): cusp forms of index one from E_{4,1}, E_{6,1}', () => {
  const E4 = at(eisensteinSource(4));
  const E6 = at(eisensteinSource(6));
  const E41 = at(jacobiEisensteinSource(4));
  const E61 = at(jacobiEisensteinSource(6));
  it('Δφ_{−2,1} = φ_{10,1} = (E_6E_{4,1} − E_4E_{6,1})/144', () => {
    const rhs = linearCombination([
      { series: multiplySeries(E6, E41), coefficient: rat(1, 144) },
      { series: multiplySeries(E4, E61), coefficient: rat(-1, 144) },
    ]);
    same(multiplySeries(at(etaPowerSource(24)), at(phiMinus2Source())), rhs);
    same(at(phi10Source()), rhs);
  });
  it('Δφ_{0,1} = φ_{12,1} = (E_4²E_{4,1} − E_6E_{6,1})/144', () => {
    const rhs = linearCombination([
      { series: multiplySeries(multiplySeries(E4, E4), E41), coefficient: rat(1, 144) },
      { series: multiplySeries(E6, E61), coefficient: rat(-1, 144) },
    ]);
    same(multiplySeries(at(etaPowerSource(24)), at(phi0Source())), rhs);
    same(at(phi12Source()), rhs);
  });
});

describe('the weak generators', () => {
  it('φ_{0,1}/φ_{−2,1} = 12℘̃, cross-multiplied: φ_{0,1}·ϑ² = 12·(℘̃ϑ²)·φ_{−2,1}', () => {
    // MATH.md §2 (℘̃ row); Eichler–Zagier 1985, §9
    const th2 = powerSeries(at(thetaSource(1)), 2);
    same(multiplySeries(at(phi0Source()), th2), scaleSeries(multiplySeries(at(wpNumeratorSource()), at(phiMinus2Source())), rat(12)));
  });
  it('432·φ_{−1,2}² = φ_{−2,1}(φ_{0,1}³ − 3E_4φ_{−2,1}²φ_{0,1} + 2E_6φ_{−2,1}³)', () => {
    // (memory) MATH.md §2, φ_{−1,2} row; this test is the independent confirmation
    const a = at(phiMinus2Source());
    const b = at(phi0Source());
    const inner = linearCombination([
      { series: powerSeries(b, 3), coefficient: rat(1) },
      { series: multiplySeries(multiplySeries(at(eisensteinSource(4)), powerSeries(a, 2)), b), coefficient: rat(-3) },
      { series: multiplySeries(at(eisensteinSource(6)), powerSeries(a, 3)), coefficient: rat(2) },
    ]);
    same(scaleSeries(powerSeries(at(phiMinus1Index2Source()), 2), rat(432)), multiplySeries(a, inner));
  });
  it('φ_{0,3/2}·ϑ(z) = ϑ(2z) and φ_{0,3/2}²·φ_{−2,1} = φ_{−1,2}²', () => {
    // Definition check: exact division reproduces the numerator (MATH.md §2, φ_{0,3/2} row)
    same(multiplySeries(at(phi0Index3HalfSource()), at(thetaSource(1))), at(thetaSource(2)));
    // φ_{0,3/2}² · φ_{−2,1} = (ϑ(2z)²/ϑ(z)²)(ϑ(z)²/η⁶) = (ϑ(2z)/η³)² = φ_{−1,2}² (follows from the definitions)
    same(multiplySeries(powerSeries(at(phi0Index3HalfSource()), 2), at(phiMinus2Source())), powerSeries(at(phiMinus1Index2Source()), 2));
  });

  it('℘̃ = 1/12 + ζ/(1−ζ)² + Σ_{n≥1} Σ_{d|n} d(ζ^d − 2 + ζ^{−d})qⁿ, times ϑ²', () => {
    // MATH.md §2 (℘̃ row); the classical q-expansion of ℘ (e.g. Silverman, *Advanced Topics*, I.6.2).
    // ϑ²·ζ/(1−ζ)² = ϑ²/(ζ^{1/2} − ζ^{−1/2})² = q^{1/4}P², P = Π(1−qⁿζ)(1−qⁿζ^{−1})(1−qⁿ) (triple product).
    const N = 25;
    const XN = rat(N);
    const one = (n: number, halves: number): QZSeries => {
      const slices: Slice[] = new Array<Slice>(N + 1).fill(EMPTY_SLICE);
      slices[0] = { lo: 0, c: [ONE] };
      slices[n] = { lo: halves, c: [int(-1)] };
      return makeSeries(rat(0), 1, ONE, slices, XN);
    };
    let P = constantSeries(rat(1), XN);
    for (let n = 1; n <= N; n++) P = multiplySeries(multiplySeries(multiplySeries(P, one(n, 2)), one(n, -2)), one(n, 0));
    const S: Slice[] = new Array<Slice>(N + 1).fill(EMPTY_SLICE);
    for (let n = 1; n <= N; n++) {
      const c: Int[] = new Array<Int>(4 * n + 1).fill(int(0));
      for (let d = 1; d <= n; d++) {
        if (n % d !== 0) continue;
        c[2 * n + 2 * d] = JSBI.add(c[2 * n + 2 * d]!, int(d));
        c[2 * n - 2 * d] = JSBI.add(c[2 * n - 2 * d]!, int(d));
        c[2 * n] = JSBI.add(c[2 * n]!, int(-2 * d));
      }
      S[n] = trimSlice(-2 * n, c);
    }
    const sumS = linearCombination([
      { series: makeSeries(rat(0), 1, ONE, S, XN), coefficient: rat(1) },
      { series: constantSeries(rat(1), XN), coefficient: rat(1, 12) },
    ]);
    const th2 = powerSeries(thetaSource(1).expand(radd(XN, rat(1, 8))), 2);
    const expected = linearCombination([
      { series: multiplySeries(th2, sumS), coefficient: rat(1) },
      { series: shiftSeries(multiplySeries(P, P), rat(1, 4)), coefficient: rat(1) },
    ]);
    same(wpNumeratorSource().expand(radd(XN, rat(1, 4))), expected);
  });
});
