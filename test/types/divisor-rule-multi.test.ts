/** The divisor rule in several variables (MATH.md §3: one-variable rule per primitive direction). */
import { describe, expect, it } from 'vitest';
import { thetaQuotientHolomorphicMulti, primitiveDirection } from '../../src/types/divisor-rule-multi.js';

const th = (l: number[], exponent = 1): { l: number[]; exponent: number } => ({ l, exponent });

describe('primitiveDirection', () => {
  it('ℓ = multiple · direction, direction primitive with first non-zero entry positive', () => {
    expect(primitiveDirection([2, 2])).toEqual({ direction: [1, 1], multiple: 2 });
    expect(primitiveDirection([-3])).toEqual({ direction: [1], multiple: -3 });
    expect(primitiveDirection([0, -4, 6])).toEqual({ direction: [0, 2, -3], multiple: -2 });
    expect(primitiveDirection([1, -1])).toEqual({ direction: [1, -1], multiple: 1 });
    expect(() => primitiveDirection([0, 0])).toThrow(RangeError); // ϑ(0) ≡ 0 (MATH.md §3)
  });
});

describe('thetaQuotientHolomorphicMulti (MATH.md §3)', () => {
  it('ϑ(z1)ϑ(z2)ϑ(z1+z2)/η is holomorphic (no theta in the denominator; η has no zeros)', () => {
    expect(thetaQuotientHolomorphicMulti([th([1, 0]), th([0, 1]), th([1, 1])]).holomorphic).toBe(true);
  });
  it('ϑ(z1+z2)/(ϑ(z1)ϑ(z2)) is not: three different directions, the denominators are uncancelled', () => {
    const r = thetaQuotientHolomorphicMulti([th([1, 1]), th([1, 0], -1), th([0, 1], -1)]);
    expect(r.holomorphic).toBe(false);
    expect(r.pole?.d).toBe(1);
    expect(r.pole?.order).toBe(-1);
  });
  it('ϑ(2z1)/ϑ(z1) is holomorphic (one direction: order 0 at d = 1, 1 at d = 2)', () => {
    expect(thetaQuotientHolomorphicMulti([th([2, 0]), th([1, 0], -1)]).holomorphic).toBe(true);
    expect(thetaQuotientHolomorphicMulti([th([1, 0]), th([2, 0], -1)]).pole).toEqual({ direction: [1, 0], d: 2, order: -1 });
  });
  it('ϑ(2z1+2z2)/ϑ(z1+z2) is holomorphic (direction (1,1), a = 2 over a = 1)', () => {
    expect(thetaQuotientHolomorphicMulti([th([2, 2]), th([1, 1], -1)]).holomorphic).toBe(true);
  });
  it('ϑ(z1)/ϑ(−z1) is holomorphic (same direction, a = 1 each; ϑ is odd, MATH.md §2)', () => {
    expect(thetaQuotientHolomorphicMulti([th([1, 0]), th([-1, 0], -1)]).holomorphic).toBe(true);
    expect(thetaQuotientHolomorphicMulti([th([1, -1]), th([-1, 1], -1)]).holomorphic).toBe(true);
  });
  it('different directions never cancel: ϑ(z1+z2)/ϑ(z1−z2) has a pole', () => {
    expect(thetaQuotientHolomorphicMulti([th([1, 1]), th([1, -1], -1)]).holomorphic).toBe(false);
  });
  it('one variable reduces to the one-variable rule: ϑ(6z)ϑ(z)/(ϑ(2z)ϑ(3z)) holomorphic, ϑ(2z)ϑ(3z)/ϑ(6z) not (orders at d = 6)', () => {
    expect(thetaQuotientHolomorphicMulti([th([6]), th([1]), th([2], -1), th([3], -1)]).holomorphic).toBe(true);
    expect(thetaQuotientHolomorphicMulti([th([2]), th([3]), th([6], -1)]).holomorphic).toBe(false);
  });
});
