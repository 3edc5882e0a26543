/**
 * Exact integer series in doubles. A theta block — theta leaves over a power of η — has
 * small integer coefficients although its factors' majorants multiply up to far more:
 * the triangle inequality cannot see the cancellation against 1/η^a (MATH.md §8). When
 * every coefficient is an integer and every product and partial sum on the way is
 * checked below 2^53 before it is formed, doubles compute such a series exactly; it is
 * then its own majorant, and its residues modulo any prime are one reduction away.
 * Nothing here estimates: a grid exists only if its values are the true coefficients.
 */
import { JSBI, ONE } from '../integer.js';
import { type Rational, rcmp, radd, rat } from '../rational.js';
import { type QZSeries, sliceCountTo } from '../qz-series.js';
import type { NttPrime } from '../modular/ntt-primes.js';
import { type GridShape, type ResidueSeries, layoutOfSeries, columnSpan, cutColumns } from './residue-series.js';
import { type Majorant, blockOf, majorantFromLog2, withOffset, zeroMajorant, up } from './majorant.js';
import { integersModulo, sumAbs } from './shared-integers.js';

/**
 * Every coefficient, product and partial sum is kept below 2^52: integers below 2^53 are
 * exact in doubles, and the factor 2 leaves room for the rounding of the bounds that
 * are checked and for two-prime CRT (integer-multiply.ts).
 */
export const EXACT_LIMIT = 2 ** 52;

/** The coefficients of a one-variable series, exact integers in doubles, rows × width. */
export interface IntegerGrid extends GridShape {
  readonly data: Float64Array;
}

/** The exact series as an integer grid; null unless every coefficient is an integer below EXACT_LIMIT. */
export function integersOfSeries(s: QZSeries): IntegerGrid | null {
  if (s.nvars !== 1 || !JSBI.equal(s.den, ONE)) return null;
  const { shape, forEachCell } = layoutOfSeries(s);
  const data = new Float64Array(shape.rows * shape.width);
  let exact = true;
  forEachCell((t, c) => {
    const x = JSBI.toNumber(c);
    if (!(Math.abs(x) < EXACT_LIMIT)) exact = false;
    data[t] = x;
  });
  return exact ? { ...shape, data } : null;
}

export function zeroIntegers(start: Rational, qDen: number, exactTo: Rational): IntegerGrid {
  const rows = sliceCountTo(start, qDen, exactTo);
  return { start, qDen, rows, exactTo, zLo: 0, zStep: 1, width: 1, data: new Float64Array(rows) };
}

/** The rows with exponent ≤ X (X ≤ exactTo). */
export function truncateIntegers(g: IntegerGrid, X: Rational): IntegerGrid {
  if (rcmp(X, g.exactTo) > 0) throw new RangeError('internal: integers asked past their q-order');
  const rows = sliceCountTo(g.start, g.qDen, X);
  return { ...g, rows, exactTo: X, data: rows === g.rows ? g.data : g.data.subarray(0, rows * g.width) };
}

/** The same grid without the columns that are zero in every row. */
export function trimIntegerColumns(g: IntegerGrid): IntegerGrid {
  const { width, rows } = g;
  const { lo, hi } = columnSpan([g.data], rows, width);
  if (hi < lo) return { ...g, zLo: 0, zStep: 1, width: 1, data: new Float64Array(rows) };
  if (lo === 0 && hi === width - 1) return g;
  const w = hi - lo + 1;
  return { ...g, zLo: g.zLo + lo * g.zStep, width: w, zStep: w === 1 ? 1 : g.zStep, data: cutColumns(g.data, rows, width, lo, w, new Float64Array(rows * w)) };
}

export function residuesOfIntegers(g: IntegerGrid, primes: readonly NttPrime[]): ResidueSeries {
  return { ...g, primes, data: primes.map(({ p }) => integersModulo(g.data, p)) };
}

/** The majorant to X with blocks of h q-steps: its own block sums of |c|, rounded up. */
export function majorantOfIntegers(g: IntegerGrid, X: Rational, h: number): Majorant {
  const first = blockOf(g.start, h);
  const last = blockOf(X, h);
  if (last < first) return zeroMajorant(h, first);
  const sums = new Float64Array(last - first + 1);
  const counts = new Float64Array(last - first + 1);
  const rows = Math.min(g.rows, sliceCountTo(g.start, g.qDen, X));
  for (let i = 0; i < rows; i++) {
    const j = blockOf(radd(g.start, rat(i, g.qDen)), h) - first;
    sums[j] += sumAbs(g.data.subarray(i * g.width, (i + 1) * g.width));
    counts[j] += 1;
  }
  const log2 = Array.from(sums, (s, j) => (s === 0 ? -Infinity : up(Math.log2(s * (1 + (counts[j]! + 1) * 2 ** -52)))));
  const m = majorantFromLog2(h, first, log2);
  return g.qDen === 1 ? withOffset(m, g.start) : m;
}
