/**
 * Helpers for the modular back-end tests: seeded random exact series on varied grids,
 * a grid-independent text of residue series, and exact comparisons.
 */
import { expect } from 'vitest';
import fc from 'fast-check';
import {
  type Int,
  type QZSeries,
  type Rational,
  type ResidueSeries,
  type NttPrime,
  type Slice,
  EMPTY_SLICE,
  JSBI,
  int,
  rat,
  radd,
  rcmp,
  makeSeries,
  trimSlice,
  forEachTerm,
  rationalToString,
  sliceExponent,
  subtractSeries,
  isZeroSeries,
  nttPrimes,
  abs,
} from '../../../src/series/index.js';

export interface ShapeOptions {
  readonly maxRows: number;
  /** Largest |ζ-exponent| (halves) of a slice's first entry, and largest slice length. */
  readonly width: number;
  /** Bits of the random numerators. */
  readonly bits: readonly number[];
  /** Every slice a single entry at this ζ-exponent (halves): a one-column series. */
  readonly oneColumn?: number;
  /** Lowest slice non-zero with numerator ±1 (a unit lead for Miller's recurrence). */
  readonly unitLead?: boolean;
  /** Denominators to draw from (default 1, 1, 2, 3, 12). */
  readonly dens?: readonly number[];
  /** q-denominators to draw from (default 1, 2, 8). */
  readonly qDens?: readonly number[];
}

interface RawSeries {
  readonly startNum: number;
  readonly qDen: number;
  readonly den: number;
  readonly extra: number;
  readonly bits: number;
  readonly density: number;
  readonly leadSign: number;
  readonly rows: readonly { lo: number; c: readonly [number, bigint][] }[];
}

/** The test oracle may use the language's integers; the engine sees JSBI only. */
function toInt(x: bigint): Int {
  return JSBI.BigInt(x.toString());
}

/**
 * Random one-variable exact series: start a multiple of 1/8 in [−2, 2] (so 1/8, −3/2, …),
 * q-denominator 1, 2 or 8, ζ-exponents in halves, numerators of the chosen bit sizes
 * with both signs, densities from sparse to full, and an order that sometimes lies
 * between two grid points.
 */
export function seriesArb(o: ShapeOptions): fc.Arbitrary<QZSeries> {
  const entry = fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.bigInt({ min: -(1n << 60n), max: 1n << 60n }));
  return fc
    .record({
      startNum: fc.integer({ min: -16, max: 16 }),
      qDen: fc.constantFrom(...(o.qDens ?? [1, 2, 8])),
      den: fc.constantFrom(...(o.dens ?? [1, 1, 2, 3, 12])),
      extra: fc.constantFrom(0, 0, 1),
      bits: fc.constantFrom(...o.bits),
      density: fc.constantFrom(0.15, 0.5, 1),
      leadSign: fc.constantFrom(1, -1),
      rows: fc.array(
        fc.record({
          lo: fc.integer({ min: -o.width, max: o.width }),
          c: fc.array(entry, { minLength: 0, maxLength: o.oneColumn === undefined ? o.width : 1 }),
        }),
        { minLength: 1, maxLength: o.maxRows },
      ),
    })
    .map((r) => buildSeries(r, o));
}

function buildSeries(r: RawSeries, o: ShapeOptions): QZSeries {
  const mask = (1n << BigInt(r.bits)) - 1n;
  const slices: Slice[] = r.rows.map((row, i) => {
    const c = row.c.map(([u, v]) => (u < r.density ? toInt(v < 0n ? -(-v & mask) : v & mask) : int(0)));
    if (i === 0 && o.unitLead === true) return { lo: o.oneColumn ?? 0, c: [int(r.leadSign)] };
    if (c.length === 0) return EMPTY_SLICE;
    return trimSlice(o.oneColumn ?? row.lo, c);
  });
  const start = rat(r.startNum, 8);
  // exactTo = start + (rows − 1)/qDen, or a third of a step beyond (between grid points)
  const exactTo = radd(start, rat(3 * (r.rows.length - 1) + r.extra, 3 * r.qDen));
  return makeSeries(start, r.qDen, int(o.unitLead === true ? 1 : r.den), slices, exactTo);
}

/** log₂ of a non-negative JSBI, to double precision (−∞ for 0). */
export function log2Int(x: Int): number {
  const a = abs(x);
  if (JSBI.equal(a, int(0))) return -Infinity;
  const s = a.toString(16);
  const lead = s.slice(0, 13);
  return Math.log2(Number.parseInt(lead, 16)) + 4 * (s.length - lead.length);
}

/** max |numerator| of s (numerators over s.den). */
export function maxNumerator(s: QZSeries): Int {
  let m: Int = int(0);
  for (const sl of s.slices) forEachTerm(sl, (_e, c) => (m = JSBI.greaterThan(abs(c), m) ? abs(c) : m));
  return m;
}

/** The first primes of the table whose product exceeds 2·h (so CRT recovers |x| ≤ h). */
export function primesAbove(h: Int, atLeast = 1): readonly NttPrime[] {
  const table = nttPrimes();
  const twice = JSBI.multiply(h, int(2));
  let M: Int = int(1);
  const out: NttPrime[] = [];
  for (const pr of table) {
    if (out.length >= atLeast && JSBI.greaterThan(M, twice)) break;
    out.push(pr);
    M = JSBI.multiply(M, int(pr.p));
  }
  return out;
}

/**
 * The non-zero entries of a residue series up to q-order X (default: all), as sorted
 * `exponent ζ-halves r₁,r₂,…` lines: independent of start, grid, width and padding.
 */
export function residueTerms(r: ResidueSeries, X: Rational = r.exactTo): string[] {
  const out: string[] = [];
  for (let i = 0; i < r.rows; i++) {
    const x = sliceExponent(r, i);
    if (rcmp(x, X) > 0) break;
    for (let j = 0; j < r.width; j++) {
      const vals = r.data.map((a) => a[i * r.width + j]!);
      if (vals.every((v) => v === 0)) continue;
      out.push(`${rationalToString(x)} ${r.zLo + j * r.zStep} ${vals.join(',')}`);
    }
  }
  return out.sort();
}

/** Exact equality of two series, q-order included. */
export function expectSameSeries(got: QZSeries, want: QZSeries): void {
  expect(rationalToString(got.exactTo)).toBe(rationalToString(want.exactTo));
  expect(isZeroSeries(subtractSeries(got, want))).toBe(true);
}

/** A residue series is well formed: one array per prime, rows × width entries in [0, p). */
export function expectWellFormed(r: ResidueSeries): void {
  expect(r.data.length).toBe(r.primes.length);
  r.data.forEach((a, i) => {
    expect(a.length).toBe(r.rows * r.width);
    const p = r.primes[i]!.p;
    for (const v of a) if (v < 0 || v >= p) throw new Error(`residue ${v} outside [0, ${p})`);
  });
}

/** Random subsets of the prime table (1–4 primes), the same array object for both factors. */
export const primeSetArb = (maxCount = 4): fc.Arbitrary<readonly NttPrime[]> =>
  fc
    .uniqueArray(fc.integer({ min: 0, max: nttPrimes().length - 1 }), { minLength: 1, maxLength: maxCount })
    .map((idx) => idx.map((i) => nttPrimes()[i]!));

/** min of rationals. */
export function rminAll(xs: readonly Rational[]): Rational {
  return xs.reduce((a, b) => (rcmp(a, b) <= 0 ? a : b));
}
