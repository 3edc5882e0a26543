/**
 * Published values through the modular route (expandModular): Ramanujan's Δ and τ, the
 * identity E_4³ − E_6² = 1728Δ to q^500, and Klein's j = E_4³/Δ.
 */
import { describe, expect, it } from 'vitest';
import {
  type Int,
  JSBI,
  int,
  rat,
  expandModular,
  productSource,
  powerSource,
  sumSource,
  isZeroSeries,
  rationalToString,
  coefficientAt,
  scaleSeries,
} from '../../../src/series/index.js';
import { etaPowerSource, eisensteinSource } from '../../../src/forms/leaves.js';
import { etaPowerSeries } from '../../../src/forms/eta.js';
import { readOeis } from '../../helpers/oeis.js';
import { qCoefficients } from '../../helpers/series.js';
import { expectSameSeries } from './residue-helpers.js';

/** τ(1 … N) from Δ = η^24 = Σ τ(n) qⁿ expanded through the modular route. */
function tauModular(N: number): Int[] {
  const got = expandModular(etaPowerSource(24), rat(N))!;
  expect(got).not.toBeNull();
  return Array.from({ length: N }, (_, i) => coefficientAt(got.series, rat(i + 1), 0).num);
}

function sigma(k: number, n: number): Int {
  let s = int(0);
  for (let d = 1; d <= n; d++) if (n % d === 0) s = JSBI.add(s, JSBI.exponentiate(int(d), int(k)));
  return s;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

describe('Δ = η^24 through the modular route', () => {
  const N = 100;
  const tau = tauModular(N);
  it('the first 28 values of τ (OEIS A000594) and all 100 against the exact engine', () => {
    const seq = readOeis('A000594'); // OEIS A000594, offset 1: the file holds τ(1 … 28)
    expect(tau.slice(0, seq.terms.length).map(String)).toEqual(seq.terms);
    const exact = etaPowerSeries(24, rat(N));
    expect(tau.map(String)).toEqual(qCoefficients(exact, N, rat(1)));
  });
  it("Ramanujan's congruence τ(n) ≡ σ_11(n) mod 691 for n ≤ 100", () => {
    // Ramanujan, "On certain arithmetical functions", Trans. Cambridge Philos. Soc. 22 (1916)
    for (let n = 1; n <= N; n++) {
      const d = JSBI.remainder(JSBI.subtract(tau[n - 1]!, sigma(11, n)), int(691));
      expect(JSBI.toNumber(d), `n = ${n}`).toBe(0);
    }
  });
  it('multiplicativity and τ(p²) = τ(p)² − p^11 (Mordell 1917)', () => {
    // Mordell, "On Mr. Ramanujan's empirical expansions of modular functions", Proc. Cambridge Philos. Soc. 19 (1917)
    for (let m = 2; m <= N; m++) {
      for (let n = 2; m * n <= N; n++) {
        if (gcd(m, n) !== 1) continue;
        expect(String(tau[m * n - 1]), `τ(${m}·${n})`).toBe(String(JSBI.multiply(tau[m - 1]!, tau[n - 1]!)));
      }
    }
    for (const p of [2, 3, 5, 7]) {
      const want = JSBI.subtract(JSBI.multiply(tau[p - 1]!, tau[p - 1]!), JSBI.exponentiate(int(p), int(11)));
      expect(String(tau[p * p - 1])).toBe(String(want));
    }
  });
});

describe('E_4³ − E_6² = 1728Δ through the modular route', () => {
  it('to q^500: the difference E_4³ − E_6² − 1728Δ vanishes, and E_4³ − E_6² is 1728·Δ exactly', () => {
    // Ramanujan's identity 1728Δ = E_4³ − E_6² (e.g. Zagier, "Elliptic modular forms and their applications", 2008, §2.4)
    const X = rat(500);
    const e4cubed = powerSource(eisensteinSource(4), 3);
    const e6squared = powerSource(eisensteinSource(6), 2);
    const diff = sumSource([
      { source: e4cubed, coefficient: rat(1) },
      { source: e6squared, coefficient: rat(-1) },
      { source: etaPowerSource(24), coefficient: rat(-1728) },
    ]);
    const zero = expandModular(diff, X)!;
    expect(rationalToString(zero.series.exactTo)).toBe('500');
    expect(isZeroSeries(zero.series)).toBe(true);
    // the height bound is that of E_4³ (about 10^27 at q^500), so several primes were used
    expect(zero.route.primes.length).toBeGreaterThan(2);
    const lhs = expandModular(
      sumSource([
        { source: powerSource(eisensteinSource(4), 3), coefficient: rat(1) },
        { source: powerSource(eisensteinSource(6), 2), coefficient: rat(-1) },
      ]),
      X,
    )!;
    expectSameSeries(lhs.series, scaleSeries(etaPowerSeries(24, X), rat(1728)));
  });
});

describe("Klein's j = E_4³/Δ through the modular route", () => {
  it('q^−1 + 744 + 196884q + … (OEIS A000521)', () => {
    const seq = readOeis('A000521'); // OEIS A000521, offset −1
    const j = productSource([powerSource(eisensteinSource(4), 3), etaPowerSource(-24)]);
    const got = expandModular(j, rat(seq.terms.length - 2))!;
    expect(qCoefficients(got.series, seq.terms.length, rat(-1))).toEqual(seq.terms);
  });
});
