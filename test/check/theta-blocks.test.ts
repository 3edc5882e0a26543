/**
 * Holomorphy and cusp assertions on theta blocks decided two ways — by coefficients
 * (the checker, MATH.md §6) and by the exact order function of Gritsenko–Skoruppa–
 * Zagier (*Theta blocks*, 2019; types/theta-block-order.ts) — must agree.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { thetaQuotientHolomorphic, thetaBlockClass, type ThetaFactor } from '../../src/types/index.js';
import { mod, rat, rationalToString } from '../../src/series/index.js';
import { checkOne } from '../helpers/check.js';

interface Block {
  readonly e0: number;
  readonly factors: ThetaFactor[];
}

function blockText(b: Block): string {
  const num = b.factors.filter((f) => f.exponent > 0).map((f) => `theta(${f.a}z)^${f.exponent}`);
  const den = b.factors.filter((f) => f.exponent < 0).map((f) => `theta(${f.a}z)^${-f.exponent}`);
  if (b.e0 > 0) num.push(`eta^${b.e0}`);
  if (b.e0 < 0) den.push(`eta^${-b.e0}`);
  return `(${num.length > 0 ? num.join('*') : '1'})/(${den.length > 0 ? den.join('*') : '1'})`;
}

function typeText(b: Block): string {
  const thetas = b.factors.reduce((s, f) => s + f.exponent, 0);
  const index = b.factors.reduce((s, f) => s + f.exponent * f.a * f.a, 0);
  const D = mod(3 * thetas + b.e0, 24);
  return `jacobi(weight ${rationalToString(rat(thetas + b.e0, 2))}, index ${rationalToString(rat(index, 2))}, character eta^${D})`;
}

const blockArb = fc
  .record({
    e0: fc.integer({ min: -6, max: 14 }),
    exps: fc.array(fc.integer({ min: -2, max: 3 }), { minLength: 4, maxLength: 4 }),
  })
  .map(({ e0, exps }): Block => ({ e0, factors: exps.map((exponent, i) => ({ a: i + 1, exponent })).filter((f) => f.exponent !== 0) }))
  .filter((b) => b.factors.some((f) => f.exponent > 0) && thetaQuotientHolomorphic(b.factors).holomorphic)
  .filter((b) => b.factors.reduce((s, f) => s + f.exponent * f.a * f.a, 0) <= 40);

describe('theta blocks: coefficients and the exact criterion agree', () => {
  it('the named examples', () => {
    // φ_{−2,1} = ϑ²/η⁶ weak, not holomorphic; φ_{10,1} = η¹⁸ϑ² cusp; ϑ holomorphic, not cusp; η³ϑ… (MATH.md §2, §6)
    expect(thetaBlockClass(-6, [{ a: 1, exponent: 2 }])).toBe('weak');
    expect(thetaBlockClass(18, [{ a: 1, exponent: 2 }])).toBe('cusp');
    expect(thetaBlockClass(0, [{ a: 1, exponent: 1 }])).toBe('holomorphic');
    expect(thetaBlockClass(-3, [{ a: 2, exponent: 1 }])).toBe('weak'); // φ_{−1,2}
    expect(thetaBlockClass(-8, [{ a: 1, exponent: 1 }])).toBe('not weak');
  });

  const BOUNDARY: Block[] = [
    { e0: 0, factors: [{ a: 1, exponent: 1 }] },
    { e0: 0, factors: [{ a: 1, exponent: 2 }] },
    { e0: 0, factors: [{ a: 2, exponent: 1 }] },
    { e0: -1, factors: [{ a: 1, exponent: 1 }, { a: 2, exponent: 1 }, { a: 3, exponent: 1 }] },
    { e0: 1, factors: [{ a: 1, exponent: 1 }, { a: 2, exponent: 1 }, { a: 3, exponent: 1 }] },
    { e0: -2, factors: [{ a: 2, exponent: 1 }, { a: 1, exponent: 1 }] },
    { e0: 0, factors: [{ a: 1, exponent: -1 }, { a: 2, exponent: 1 }] },
    { e0: 1, factors: [{ a: 1, exponent: -1 }, { a: 2, exponent: 1 }] },
    { e0: -8, factors: [{ a: 1, exponent: 1 }] },
  ];
  /** The checker's verdicts on weak / holomorphic / cusp must be those the exact class implies. */
  function agreeOn(b: Block): string {
    const exact = thetaBlockClass(b.e0, b.factors);
    const verdicts = ['weak', 'holomorphic', 'cusp'].map((q) => checkOne(`${blockText(b)} is ${typeText(b)} ${q}`).verdict);
    const expected = {
      'not weak': ['refuted', 'refuted', 'refuted'],
      weak: ['proved', 'refuted', 'refuted'],
      holomorphic: ['proved', 'proved', 'refuted'],
      cusp: ['proved', 'proved', 'proved'],
    }[exact];
    expect(verdicts, `${blockText(b)}: exact says ${exact}`).toEqual(expected);
    return exact;
  }

  it('on blocks at the boundary between the classes', () => {
    const seen = new Set(BOUNDARY.map(agreeOn));
    expect([...seen].sort()).toEqual(['cusp', 'holomorphic', 'not weak', 'weak']);
  });

  it('on random blocks η^{e₀}Πϑ(a z)^{e_a}, a ≤ 4, holomorphic in z', () => {
    fc.assert(
      fc.property(blockArb, (b) => {
        agreeOn(b);
      }),
      { seed: 2026, numRuns: 40 },
    );
  });
});
