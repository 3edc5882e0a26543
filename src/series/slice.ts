/**
 * One q-slice of a series: the Laurent polynomial in ζ multiplying one power of q.
 * One variable is the dense fast path: a run of integer numerators `c` whose first
 * entry is the coefficient of ζ^(lo/2) (ζ-exponents are half-integral, MATH.md §1,
 * stored in units of ½). Trimmed: `c` is empty or starts and ends with a non-zero.
 *
 * Every operation the series layer needs on slices lives here, so that a sparse
 * slice keyed by integer vectors (several variables) can be added beside the dense
 * one without touching the series algorithms.
 */
import { JSBI, type Int, ZERO, isZero } from './integer.js';

export interface Slice {
  /** ζ-exponent of c[0], in units of ½. */
  readonly lo: number;
  readonly c: readonly Int[];
}

export const EMPTY_SLICE: Slice = { lo: 0, c: [] };

/** Drops zero numerators at both ends; returns EMPTY_SLICE when nothing is left. */
export function trimSlice(lo: number, c: Int[]): Slice {
  let a = 0;
  let b = c.length;
  while (a < b && isZero(c[a]!)) a++;
  while (b > a && isZero(c[b - 1]!)) b--;
  if (a === b) return EMPTY_SLICE;
  return { lo: lo + a, c: a === 0 && b === c.length ? c : c.slice(a, b) };
}

export function sliceIsZero(s: Slice): boolean {
  return s.c.length === 0;
}

/** Highest ζ-exponent (halves) present; meaningful only for a non-zero slice. */
export function sliceHi(s: Slice): number {
  return s.lo + s.c.length - 1;
}

/** Number of non-zero numerators. */
export function sliceWeight(s: Slice): number {
  let n = 0;
  for (const x of s.c) if (!isZero(x)) n++;
  return n;
}

export function sliceCoefficient(s: Slice, e: number): Int {
  const k = e - s.lo;
  return k >= 0 && k < s.c.length ? s.c[k]! : ZERO;
}

/** x·a + y·b for integer scalars x, y (either may be null to mean 1). */
export function sliceCombine(a: Slice, x: Int | null, b: Slice, y: Int | null): Slice {
  if (sliceIsZero(a)) return sliceScale(b, y);
  if (sliceIsZero(b)) return sliceScale(a, x);
  const lo = Math.min(a.lo, b.lo);
  const hi = Math.max(sliceHi(a), sliceHi(b));
  const out: Int[] = new Array<Int>(hi - lo + 1).fill(ZERO);
  for (let i = 0; i < a.c.length; i++) {
    const v = a.c[i]!;
    out[a.lo - lo + i] = x === null ? v : JSBI.multiply(v, x);
  }
  for (let i = 0; i < b.c.length; i++) {
    const v = b.c[i]!;
    if (isZero(v)) continue;
    const k = b.lo - lo + i;
    out[k] = JSBI.add(out[k]!, y === null ? v : JSBI.multiply(v, y));
  }
  return trimSlice(lo, out);
}

export function sliceScale(a: Slice, x: Int | null): Slice {
  if (x === null || sliceIsZero(a)) return a;
  if (isZero(x)) return EMPTY_SLICE;
  return { lo: a.lo, c: a.c.map((v) => JSBI.multiply(v, x)) };
}

export function sliceNegate(a: Slice): Slice {
  return { lo: a.lo, c: a.c.map((v) => JSBI.unaryMinus(v)) };
}

/** Exact quotient of every numerator by an integer that divides them all. */
export function sliceDivideBy(a: Slice, d: Int): Slice {
  return { lo: a.lo, c: a.c.map((v) => JSBI.divide(v, d)) };
}

/** Laurent-polynomial product a·b (schoolbook, zeros skipped). */
export function sliceMultiply(a: Slice, b: Slice): Slice {
  if (sliceIsZero(a) || sliceIsZero(b)) return EMPTY_SLICE;
  const out: Int[] = new Array<Int>(a.c.length + b.c.length - 1).fill(ZERO);
  sliceMultiplyInto(out, 0, a, b);
  return trimSlice(a.lo + b.lo, out);
}

/** acc[off + i + j] += a[i]·b[j]; the caller owns `acc` and its offset bookkeeping. */
export function sliceMultiplyInto(acc: Int[], off: number, a: Slice, b: Slice): void {
  for (let i = 0; i < a.c.length; i++) {
    const x = a.c[i]!;
    if (isZero(x)) continue;
    const base = off + i;
    for (let j = 0; j < b.c.length; j++) {
      const y = b.c[j]!;
      if (isZero(y)) continue;
      acc[base + j] = JSBI.add(acc[base + j]!, JSBI.multiply(x, y));
    }
  }
}

/** ζ^(e/2) ↦ ζ^(a·e/2); a = 0 evaluates at ζ = 1 (the substitution z ↦ 0). */
export function sliceSubstitute(s: Slice, a: number): Slice {
  if (sliceIsZero(s)) return s;
  if (a === 0) {
    let t = ZERO;
    for (const v of s.c) t = JSBI.add(t, v);
    return trimSlice(0, [t]);
  }
  if (a === 1) return s;
  const n = s.c.length;
  const out: Int[] = new Array<Int>((n - 1) * Math.abs(a) + 1).fill(ZERO);
  const lo = a > 0 ? s.lo * a : sliceHi(s) * a;
  for (let i = 0; i < n; i++) out[(s.lo + i) * a - lo] = s.c[i]!;
  return trimSlice(lo, out);
}

/** Multiplies the coefficient of ζ^(e/2) by w(e) (an integer weight per exponent). */
export function sliceWeighted(s: Slice, w: (e: number) => Int): Slice {
  const out: Int[] = s.c.map((v, i) => (isZero(v) ? v : JSBI.multiply(v, w(s.lo + i))));
  return trimSlice(s.lo, out);
}

/** Shifts every ζ-exponent by `d` halves (multiplication by ζ^(d/2)). */
export function sliceShift(s: Slice, d: number): Slice {
  return sliceIsZero(s) ? s : { lo: s.lo + d, c: s.c };
}

/**
 * Exact Laurent-polynomial division a / b, or null when b does not divide a.
 * Requires the lowest coefficient of b to be ±1 (theta blocks satisfy this), so the
 * quotient of integer numerators stays integral.
 */
export function sliceDivideExact(a: Slice, b: Slice): Slice | null {
  if (sliceIsZero(b)) throw new RangeError('slice division by zero');
  if (sliceIsZero(a)) return EMPTY_SLICE;
  const lead = b.c[0]!;
  const unit = JSBI.equal(lead, JSBI.BigInt(1)) ? 1 : JSBI.equal(lead, JSBI.BigInt(-1)) ? -1 : 0;
  if (unit === 0) throw new RangeError('slice division needs a divisor with lowest coefficient ±1');
  const qlen = a.c.length - b.c.length + 1;
  if (qlen <= 0) return null;
  const rem = a.c.slice();
  const q: Int[] = new Array<Int>(qlen).fill(ZERO);
  for (let i = 0; i < qlen; i++) {
    const r = rem[i]!;
    if (isZero(r)) continue;
    const t = unit === 1 ? r : JSBI.unaryMinus(r);
    q[i] = t;
    for (let j = 0; j < b.c.length; j++) {
      const y = b.c[j]!;
      if (!isZero(y)) rem[i + j] = JSBI.subtract(rem[i + j]!, JSBI.multiply(t, y));
    }
  }
  for (let k = qlen; k < rem.length; k++) if (!isZero(rem[k]!)) return null;
  return trimSlice(a.lo - b.lo, q);
}

/** gcd of all numerators folded into g. */
export function sliceContentGcd(s: Slice, g: Int, gcd: (a: Int, b: Int) => Int): Int {
  let r = g;
  for (const v of s.c) {
    if (isZero(v)) continue;
    r = gcd(r, v);
    if (JSBI.equal(r, JSBI.BigInt(1))) return r;
  }
  return r;
}
