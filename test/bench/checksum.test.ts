/**
 * The benchmark checksum on series small enough to check by hand. ζ-exponents near
 * −1000 halves make the weight 5^(e+1000) a small power of 5.
 */
import { describe, expect, it } from 'vitest';
import { seriesChecksum, powMod, P } from '../../bench/checksum.mjs';
import { int } from '../../src/series/index.js';

const ONE = int(1);
const slices = (rows: [number, number[]][]) => rows.map(([lo, c]) => ({ lo, c: c.map(int) }));

describe('bench checksum', () => {
  it('P is 2^61 − 1 and powMod is right on hand values', () => {
    expect(P.toString()).toBe('2305843009213693951');
    expect(powMod(int(2), 61).toString()).toBe('1'); // 2^61 ≡ 1
    expect(powMod(int(2), 64).toString()).toBe('8');
    expect(powMod(int(3), 4).toString()).toBe('81');
  });

  it('sum and wsum of a two-slice series', () => {
    // q^0: ζ^{-500} − 2ζ^{-499.5}  (weights 5^0, 5^1);  q^1: 4ζ^{-500}  (weight 3·5^0)
    const s = { qDen: 1, den: ONE, slices: slices([[-1000, [1, -2]], [-1000, [4]]]) };
    // sum = 1 − 2 + 4 = 3;  wsum = 1 − 2·5 + 4·3 = 3
    expect(seriesChecksum(s)).toEqual({ sum: '3', wsum: '3', leadIndex: 0 });
  });

  it('negative totals reduce to [0, P); k counts from the first non-zero slice', () => {
    // index 0 empty; lead at index 1 (k = 0): −2ζ^{-500}; index 2 (k = 1): −ζ^{-499.5}
    const s = { qDen: 1, den: ONE, slices: slices([[0, []], [-1000, [-2]], [-999, [-1]]]) };
    // sum = −3 ≡ P − 3;  wsum = −2 − 3·5 = −17 ≡ P − 17
    expect(seriesChecksum(s)).toEqual({ sum: '2305843009213693948', wsum: '2305843009213693934', leadIndex: 1 });
  });

  it('e < −1000 uses the inverse of 5; q-steps are qDen slices', () => {
    // qDen = 2: index 0 lead (k = 0) 5ζ^{-500.5}; index 1 half-step, empty; index 2 (k = 1) 1·ζ^{-500}
    const s = { qDen: 2, den: ONE, slices: slices([[-1001, [5]], [0, []], [-1000, [1]]]) };
    // wsum = 5·5^{-1} + 1·3 = 4
    expect(seriesChecksum(s)).toEqual({ sum: '6', wsum: '4', leadIndex: 0 });
  });

  it('refuses fractional coefficients and non-zero slices off the integer-step grid', () => {
    expect(() => seriesChecksum({ qDen: 1, den: int(2), slices: slices([[0, [1]]]) })).toThrow(/denominator/);
    expect(() => seriesChecksum({ qDen: 2, den: ONE, slices: slices([[0, [1]], [0, [1]]]) })).toThrow(/q-steps/);
  });
});
