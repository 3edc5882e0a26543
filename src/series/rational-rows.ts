/**
 * Slices from rows of rational coefficients (ζ-exponent in halves → value), put over
 * one common denominator: the form every coefficient-formula operator produces.
 */
import { JSBI, type Int, ONE, ZERO, lcm } from './integer.js';
import type { Rational } from './rational.js';
import { type Slice, EMPTY_SLICE, trimSlice } from './slice.js';

export interface RationalRows {
  readonly den: Int;
  readonly slices: Slice[];
}

export function slicesFromRationalRows(rows: readonly ReadonlyMap<number, Rational>[]): RationalRows {
  let den: Int = ONE;
  for (const row of rows) for (const v of row.values()) den = lcm(den, v.den);
  const slices = rows.map((row) => {
    if (row.size === 0) return EMPTY_SLICE;
    const keys = [...row.keys()];
    const lo = Math.min(...keys);
    const c: Int[] = new Array<Int>(Math.max(...keys) - lo + 1).fill(ZERO);
    for (const [h, v] of row) c[h - lo] = JSBI.multiply(v.num, JSBI.divide(den, v.den));
    return trimSlice(lo, c);
  });
  return { den, slices };
}
