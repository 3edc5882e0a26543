/**
 * JSBI values from 30-bit limbs (integer-limbs.ts) against the language's own integers
 * as an independent oracle: both construction paths, both signs, leading zero limbs,
 * and Horner steps limbs·m + a at the extremes of m, a < 2^30.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { intFromLimbs, mulAddLimbs, digitLayoutInUse, LIMB_BITS } from '../../src/series/integer-limbs.js';

const SEED = 3030;

function limbsOf(x: bigint, pad: number): number[] {
  const out: number[] = [];
  for (let y = x; y > 0n; y >>= 30n) out.push(Number(y & ((1n << 30n) - 1n)));
  for (let i = 0; i < pad; i++) out.push(0);
  return out;
}

function valueOf(limbs: ArrayLike<number>, len: number): bigint {
  let x = 0n;
  for (let i = len - 1; i >= 0; i--) x = (x << BigInt(LIMB_BITS)) + BigInt(limbs[i]!);
  return x;
}

describe('JSBI from limbs', () => {
  it('the installed jsbi has the digit layout the fast path assumes (else every value takes the slow path)', () => {
    expect(digitLayoutInUse()).toBe(true);
  });
  it('equals the decimal value, by digits and by the public arithmetic, with leading zeros and both signs', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 0n, max: (1n << 400n) - 1n }), fc.integer({ min: 0, max: 2 }), fc.boolean(), (x, pad, neg) => {
        const l = limbsOf(x, pad);
        const want = (neg ? -x : x).toString();
        expect(intFromLimbs(l, l.length, neg, true).toString()).toBe(x === 0n ? '0' : want);
        expect(intFromLimbs(l, l.length, neg, false).toString()).toBe(x === 0n ? '0' : want);
      }),
      { seed: SEED, numRuns: 300 },
    );
  });
  it('at the limb boundaries: 2^30 − 1, 2^30, 2^53 ± 1, 2^60 − 1, 2^90', () => {
    for (const x of [(1n << 30n) - 1n, 1n << 30n, (1n << 53n) - 1n, 1n << 53n, (1n << 53n) + 1n, (1n << 60n) - 1n, 1n << 90n]) {
      const l = limbsOf(x, 0);
      expect(intFromLimbs(l, l.length, true).toString()).toBe((-x).toString());
    }
  });
});

describe('limbs·m + a', () => {
  it('matches the oracle for m, a up to 2^30 − 1 over many steps', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 1, max: 2 ** 30 - 1 }), fc.integer({ min: 0, max: 2 ** 30 - 1 })), { minLength: 1, maxLength: 12 }),
        (steps) => {
          const limbs = new Float64Array(steps.length + 2);
          let len = 0;
          let want = 0n;
          for (const [m, a] of steps) {
            len = mulAddLimbs(limbs, len, m, a);
            want = want * BigInt(m) + BigInt(a);
            for (let i = 0; i < len; i++) expect(limbs[i]! >= 0 && limbs[i]! < 2 ** 30 && Number.isInteger(limbs[i]!)).toBe(true);
          }
          expect(valueOf(limbs, len)).toBe(want);
        },
      ),
      { seed: SEED, numRuns: 300 },
    );
    const limbs = Float64Array.from([2 ** 30 - 1, 2 ** 30 - 1, 0, 0]);
    const len = mulAddLimbs(limbs, 2, 2 ** 30 - 1, 2 ** 30 - 1);
    expect(valueOf(limbs, len)).toBe(((1n << 60n) - 1n) * ((1n << 30n) - 1n) + (1n << 30n) - 1n);
  });
});
