/**
 * The exact q,ζ-series of MATH.md §1: Σ c(x, ℓ) q^x ζ^ℓ, stored as JSBI numerators
 * over one reduced common denominator. Slice i holds q^(start + i/qDen); a series
 * built to q-order X holds every slice with exponent ≤ X and records X in `exactTo`.
 * Nothing beyond `exactTo` is ever assumed zero: an operation needing more must ask
 * for the inputs again at a higher order (ARCHITECTURE.md, the series engine).
 */
import { JSBI, type Int, ONE, ZERO, gcd, isZero, sign } from './integer.js';
import {
  type Rational,
  rational,
  radd,
  rsub,
  rmul,
  rfloor,
  rcmp,
  rat,
} from './rational.js';
import { type Slice, EMPTY_SLICE, isSparse, sliceIsZero, sliceScale, sliceContentGcd, sliceDivideBy, sliceCoefficient } from './slice.js';

export interface QZSeries {
  /** Number of abelian variables; 1 for the dense one-variable path. */
  readonly nvars: number;
  /** q-exponent of slices[0]; every coefficient below it is zero. */
  readonly start: Rational;
  /** Slice i has q-exponent start + i/qDen. */
  readonly qDen: number;
  /** Common denominator of all numerators, > 0, reduced against them. */
  readonly den: Int;
  readonly slices: readonly Slice[];
  /** Every coefficient with q-exponent ≤ exactTo is known (the q-order). */
  readonly exactTo: Rational;
}

/** How many slices of the grid (start, qDen) have exponent ≤ X. */
export function sliceCountTo(start: Rational, qDen: number, X: Rational): number {
  if (rcmp(X, start) < 0) return 0;
  const n = rfloor(rmul(rsub(X, start), rat(qDen)));
  const k = JSBI.toNumber(n) + 1;
  if (!Number.isSafeInteger(k)) throw new RangeError('series too long');
  return k;
}

export function sliceExponent(s: { start: Rational; qDen: number }, i: number): Rational {
  return radd(s.start, rat(i, s.qDen));
}

/**
 * Builds a series, dropping slices past exactTo and reducing the denominator.
 * Throws if fewer slices are given than exactTo requires: that would be padding.
 */
export function makeSeries(
  start: Rational,
  qDen: number,
  den: Int,
  slices: readonly Slice[],
  exactTo: Rational,
  nvars = 1,
): QZSeries {
  const n = sliceCountTo(start, qDen, exactTo);
  if (slices.length < n) {
    throw new RangeError(`internal: ${slices.length} slices given, ${n} needed to reach q-order`);
  }
  const kept = slices.length === n ? slices : slices.slice(0, n);
  return reduceDenominator({ nvars, start, qDen, den, slices: kept, exactTo });
}

/** Divides numerators and denominator by their common content; makes den positive. */
export function reduceDenominator(s: QZSeries): QZSeries {
  let den = s.den;
  let slices = s.slices;
  if (sign(den) < 0) {
    den = JSBI.unaryMinus(den);
    slices = slices.map((sl) => sliceScale(sl, JSBI.unaryMinus(ONE)));
  }
  if (JSBI.equal(den, ONE)) return den === s.den ? s : { ...s, den, slices };
  let g = den;
  for (const sl of slices) {
    g = sliceContentGcd(sl, g, gcd);
    if (JSBI.equal(g, ONE)) break;
  }
  if (allZero(slices)) return { ...s, den: ONE, slices };
  if (JSBI.equal(g, ONE)) return { ...s, den, slices };
  return { ...s, den: JSBI.divide(den, g), slices: slices.map((sl) => sliceDivideBy(sl, g)) };
}

function allZero(slices: readonly Slice[]): boolean {
  return slices.every(sliceIsZero);
}

export function zeroSeries(exactTo: Rational, start: Rational = exactTo, qDen = 1, nvars = 1): QZSeries {
  const n = sliceCountTo(start, qDen, exactTo);
  return { nvars, start, qDen, den: ONE, slices: new Array<Slice>(n).fill(EMPTY_SLICE), exactTo };
}

/** The constant r to q-order X. */
export function constantSeries(r: Rational, exactTo: Rational, nvars = 1): QZSeries {
  return monomialSeries(r, rat(0), 0, exactTo, nvars);
}

/** r·q^x·ζ^(e/2) to q-order X (zero slices from x on). */
export function monomialSeries(r: Rational, x: Rational, e: number, exactTo: Rational, nvars = 1): QZSeries {
  const n = sliceCountTo(x, 1, exactTo);
  const slices = new Array<Slice>(n).fill(EMPTY_SLICE);
  if (n > 0 && !isZero(r.num)) slices[0] = { lo: e, c: [r.num] };
  return { nvars, start: x, qDen: 1, den: r.den, slices, exactTo };
}

/** The coefficient of q^x ζ^(e/2); throws when x is past exactTo. */
export function coefficientAt(s: QZSeries, x: Rational, e: number | readonly number[]): Rational {
  if (rcmp(x, s.exactTo) > 0) throw new RangeError('coefficient asked past the q-order the series is exact to');
  const t = rmul(rsub(x, s.start), rat(s.qDen));
  if (!JSBI.equal(t.den, ONE) || sign(t.num) < 0) return rational(ZERO);
  const i = JSBI.toNumber(t.num);
  const sl = s.slices[i];
  return sl === undefined ? rational(ZERO) : rational(sliceCoefficient(sl, e), s.den);
}

/** The exponent of the first non-zero slice, or null if every known slice is zero. */
export function leadingExponent(s: QZSeries): Rational | null {
  for (let i = 0; i < s.slices.length; i++) if (!sliceIsZero(s.slices[i]!)) return sliceExponent(s, i);
  return null;
}

/**
 * A lower bound for the valuation that is exact when the series is non-zero within
 * its q-order; for a series known only to vanish up to X, the next grid point (or
 * `start`, when the series was built knowing that nothing lies below it).
 */
export function valuationBound(s: QZSeries): Rational {
  const lead = leadingExponent(s);
  if (lead !== null) return lead;
  const next = radd(s.exactTo, rat(1, s.qDen));
  return rcmp(s.start, next) > 0 ? s.start : next;
}

/** The same series known only to q-order X ≤ exactTo. */
export function truncateSeries(s: QZSeries, X: Rational): QZSeries {
  if (rcmp(X, s.exactTo) > 0) throw new RangeError('cannot truncate past the q-order the series is exact to');
  return makeSeries(s.start, s.qDen, s.den, s.slices, X, s.nvars);
}

/** Number of stored coefficients (non-zero or inside a dense run). */
export function storedTerms(s: QZSeries): number {
  let n = 0;
  for (const sl of s.slices) n += isSparse(sl) ? sl.vals.length : sl.c.length;
  return n;
}

/** Whether every known coefficient is zero. */
export function isZeroSeries(s: QZSeries): boolean {
  return allZero(s.slices);
}

/** The slice of q^x (the empty slice when x is off the grid or below start). */
export function sliceAtExponent(s: QZSeries, x: Rational): Slice {
  if (rcmp(x, s.exactTo) > 0) throw new RangeError('slice asked past the q-order the series is exact to');
  const t = rmul(rsub(x, s.start), rat(s.qDen));
  if (!JSBI.equal(t.den, ONE) || sign(t.num) < 0) return EMPTY_SLICE;
  return s.slices[JSBI.toNumber(t.num)] ?? EMPTY_SLICE;
}
