/**
 * Whole expansions through the modular back-end against the exact engine: random
 * expressions over θ(az), η^e, E_k, φ_{−2,1}, φ_{0,1} and every SeriesSource combinator
 * (products, powers, sums, scalings, exact quotients through the exact engine, caches,
 * shared factors), at orders on and off the integral grid. The majorants that fix the
 * primes are checked against the true coefficients of the same expansions.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  type Rational,
  rat,
  radd,
  rationalToString,
  expandModular,
  modularResidues,
  modularOf,
  majorantBlockLength,
  heightBits,
  productSource,
  powerSource,
  sumSource,
  nttPrimes,
  int,
} from '../../../src/series/index.js';
import { thetaSource, etaPowerSource, eisensteinSource } from '../../../src/forms/leaves.js';
import { exprArb, build, offsetArb, expectMajorantBounds, type Expr } from './expressions.js';
import { expectSameSeries } from './residue-helpers.js';

const SEED = 2024;

function checkExpansion(e: Expr, offsets: readonly Rational[]): void {
  for (const off of offsets) {
    const exactSide = build(e);
    const X = radd(exactSide.minX, off);
    const label = `${exactSide.text} to ${rationalToString(X)}`;
    const want = exactSide.src.expand(X);
    expect(rationalToString(want.exactTo), label).toBe(rationalToString(X));
    // a fresh build: the modular side shares no cache with the exact one
    const modSide = build(e);
    const got = expandModular(modSide.src, X);
    expect(got, label).not.toBeNull();
    expectSameSeries(got!.series, want);
    // the primes cover twice the height bound
    const M = got!.route.primes.reduce((s, p) => s + Math.log2(p), 0);
    expect(M, label).toBeGreaterThan(got!.route.heightBits + 1);
    // the same (cached) source again, at the same order and one step lower
    const again = expandModular(modSide.src, X);
    expectSameSeries(again!.series, want);
  }
}

describe('expandModular equals the exact expansion', () => {
  it('random expressions at two orders each', () => {
    fc.assert(
      fc.property(exprArb, offsetArb, offsetArb, (e, o1, o2) => checkExpansion(e, [o1, o2])),
      { seed: SEED, numRuns: 200 },
    );
  });

  it('named combinations: φ_{0,1}·φ_{−2,1}², E_4·φ_{−2,1} − E_6·θ²/η⁶·…, η-quotients', () => {
    const cases: Expr[] = [
      { kind: 'prod', factors: [{ kind: 'phi0' }, { kind: 'pow', base: { kind: 'phim2' }, k: 2 }] },
      {
        kind: 'sum',
        terms: [
          { expr: { kind: 'prod', factors: [{ kind: 'eis', k: 4 }, { kind: 'phim2' }] }, c: [1, 1] },
          { expr: { kind: 'prod', factors: [{ kind: 'eis', k: 6 }, { kind: 'phim2' }] }, c: [-1, 1] },
          { expr: { kind: 'phi0' }, c: [1, 12] },
        ],
      },
      { kind: 'prod', factors: [{ kind: 'pow', base: { kind: 'eta', e: 2 }, k: -3 }, { kind: 'pow', base: { kind: 'theta', a: 3 }, k: 3 }] },
      { kind: 'quot', t: { kind: 'theta', a: 2 }, g: { kind: 'prod', factors: [{ kind: 'theta', a: 1 }, { kind: 'eta', e: -12 }] } },
      { kind: 'pow', base: { kind: 'sum', terms: [{ expr: { kind: 'eis', k: 4 }, c: [1, 240] }, { expr: { kind: 'eis', k: 6 }, c: [-1, 504] }] }, k: 3 },
      { kind: 'prod', factors: [{ kind: 'pow', base: { kind: 'eis', k: 12 }, k: 2 }, { kind: 'eta', e: -24 }] },
    ];
    for (const e of cases) checkExpansion(e, [rat(0), rat(5, 3), rat(6)]);
  });

  it('a sum with a term asked below its valuation (E_4 + η^24 to q^{1/2}, θ + 1/η to q^0)', () => {
    const cases: [Expr, Rational][] = [
      [{ kind: 'sum', terms: [{ expr: { kind: 'eis', k: 4 }, c: [1, 1] }, { expr: { kind: 'eta', e: 24 }, c: [1, 1] }] }, rat(1, 2)],
      [{ kind: 'sum', terms: [{ expr: { kind: 'theta', a: 1 }, c: [1, 1] }, { expr: { kind: 'eta', e: -1 }, c: [1, 1] }] }, rat(0)],
    ];
    for (const [e, X] of cases) {
      const got = expandModular(build(e).src, X);
      expect(got).not.toBeNull();
      expectSameSeries(got!.series, build(e).src.expand(X));
    }
  });

  it('orders below the valuation give the empty series', () => {
    const src = productSource([etaPowerSource(24), thetaSource(2)]);
    for (const X of [rat(0), rat(1), rat(9, 8)]) {
      const got = expandModular(src, X)!;
      expectSameSeries(got.series, src.expand(X));
    }
  });
});

describe('majorants bound the coefficients they promise to bound', () => {
  it('random expressions: every block sum, the denominator and the height', () => {
    fc.assert(
      fc.property(exprArb, offsetArb, fc.constantFrom(0, 1, 2, 3), (e, off, hChoice) => {
        const b = build(e);
        const X = radd(b.minX, off);
        const h = hChoice === 0 ? majorantBlockLength(X, b.src.valuation) : hChoice;
        const m = modularOf(b.src).majorant(X, h);
        expect(m.h).toBe(h);
        expectMajorantBounds(b.src.expand(X), m, X, heightBits(m), `${b.text} to ${rationalToString(X)} (h = ${h})`);
      }),
      { seed: SEED, numRuns: 150 },
    );
  });

  it('the bound check itself fails on a majorant lowered by 10⁻⁶ or with the wrong denominator', () => {
    // the exact engine's view of θ: its majorant is the true block sums (up to a 10⁻⁹ margin)
    const X = rat(30);
    const th = thetaSource(1);
    const m = modularOf(th).majorant(X, 1);
    const s = th.expand(X);
    expectMajorantBounds(s, m, X, heightBits(m), 'θ');
    expect(() => expectMajorantBounds(s, { ...m, scale: m.scale - 1e-6 }, X, heightBits(m), 'θ lowered')).toThrow();
    const e12 = eisensteinSource(12);
    const me = modularOf(e12).majorant(X, 1);
    expect(() => expectMajorantBounds(e12.expand(X), { ...me, den: int(1) }, X, heightBits(me), 'E12 den')).toThrow();
    expect(() => expectMajorantBounds(e12.expand(X), { ...me, avoid: int(1) }, X, heightBits(me), 'E12 avoid')).toThrow();
    expect(() => expectMajorantBounds(e12.expand(X), me, X, heightBits(me) - 40, 'E12 height')).toThrow();
  });

  it('the primes of modularResidues avoid every denominator met (E_12 has 691)', () => {
    const src = sumSource([
      { source: powerSource(eisensteinSource(12), 2), coefficient: rat(1, 7) },
      { source: productSource([eisensteinSource(4), etaPowerSource(24)]), coefficient: rat(-3, 4) },
    ]);
    const m = modularResidues(src, rat(40))!;
    expect(m).not.toBeNull();
    for (const p of m.route.primes) for (const d of [691, 7, 4]) expect(p % d).not.toBe(0);
    expect(m.residues.primes.map((p) => p.p)).toEqual(m.route.primes);
    expect(nttPrimes().length).toBeGreaterThan(m.route.primes.length);
  });
});

describe('known bugs on the source level', () => {
  // Regression: (θ/η¹²)^7 takes the repeated-squaring route,
  // which cuts the partial product f³ at X although f⁴ still to come has negative
  // valuation; modularResidues then throws "residues short of the q-order asked".
  it('(θ(z)·η^−12)^7 to q^0', () => {
    const src = powerSource(productSource([thetaSource(1), etaPowerSource(-12)]), 7);
    const got = expandModular(src, rat(0));
    expectSameSeries(got!.series, src.expand(rat(0)));
  });
  // Regression: a sum term whose residues start more than one
  // grid step past the order asked (η^48 starts at q², asked to q^{1/2}) makes
  // alignResidues throw "offset is out of bounds".
  it('E_4 + η^48 to q^{1/2}', () => {
    const src = sumSource([
      { source: eisensteinSource(4), coefficient: rat(1) },
      { source: etaPowerSource(48), coefficient: rat(1) },
    ]);
    const got = expandModular(src, rat(1, 2));
    expectSameSeries(got!.series, src.expand(rat(1, 2)));
  });
  // Regression, was unsound: majorantProduct and majorantPower cut
  // every partial product at the block of X, but a partial product is needed to
  // X − (valuation of the factors still to come), past X when those are negative. For
  // E_4·E_6·η^−120 to q^−1 the partial E_4·E_6 keeps only blocks ≤ −1, i.e. nothing,
  // the majorant is empty, heightBits 0, one prime is chosen, and CRT returns
  // 3361866660 mod p (centred) for the q^−2 coefficient.
  it("a partial product's majorant cut at X: E_4·E_6·η^−120 to q^−1", () => {
    const mk = () => productSource([eisensteinSource(4), eisensteinSource(6), etaPowerSource(-120)]);
    const X = rat(-1);
    const want = mk().expand(X);
    const m = modularOf(mk()).majorant(X, majorantBlockLength(X, rat(-5)));
    expectMajorantBounds(want, m, X, heightBits(m), 'E4·E6·η^−120');
  });
  it('… and expandModular returns wrong coefficients for it', () => {
    const mk = () => productSource([eisensteinSource(4), eisensteinSource(6), etaPowerSource(-120)]);
    expectSameSeries(expandModular(mk(), rat(-1))!.series, mk().expand(rat(-1)));
  });
  it('… and so does the power rule: (E_4·η^−120)³ to q^−11', () => {
    // majorantPower cuts f² at X's block although f² is needed to X − v(f) = X + 5:
    // heightBits 0, one prime, 451121527 returned for the q^−11 coefficient 24688955790
    const mk = () => powerSource(productSource([eisensteinSource(4), etaPowerSource(-120)]), 3);
    expectSameSeries(expandModular(mk(), rat(-11))!.series, mk().expand(rat(-11)));
  });
});
