/**
 * J.C.P. Miller's recurrence for h = f^k, f = Σ a_n t^n with a_0 invertible
 * (t one q-step; the a_n are Laurent polynomials in ζ and a_0 must be a monomial):
 *   n·a_0·h_n = Σ_{j=1..n} ((k+1)·j − n)·a_j·h_{n−j}
 * (Knuth, TAOCP vol. 2, §4.7, eq. (9); it follows from f·h′ = k·f′·h). Works for
 * every integer k, negative ones included, so it also inverts units. Sparse f (a
 * pentagonal sum) makes each step cost O(#terms of f).
 *
 * Fast path: integer numerators, den = 1, a_0 = ±ζ^e; then h has integer
 * coefficients and the division by n is exact (asserted). Otherwise the recurrence
 * runs over rationals.
 */
import { JSBI, type Int, ONE, ZERO, MINUS_ONE, int, isZero } from './integer.js';
import { type Rational, rational, radd, rmul, rdiv, rpow, rat, rIsZero } from './rational.js';
import { type QZSeries, makeSeries, sliceCountTo, leadingExponent } from './qz-series.js';
import {
  type Slice,
  type DenseSlice,
  EMPTY_SLICE,
  dense,
  isSparse,
  forEachTerm,
  sliceIsZero,
  sliceWeight,
  sliceMultiply,
  sliceCombine,
  sliceScale,
  sliceShift,
  sliceDivideBy,
} from './slice.js';
import { rsub } from './rational.js';
import { shiftSeries } from './shift.js';
import { slicesFromRationalRows } from './rational-rows.js';

/** Whether the lowest non-zero slice is a single monomial (required for Miller). */
export function hasMonomialLead(f: QZSeries): boolean {
  const v = leadingExponent(f);
  if (v === null) return false;
  const i = f.slices.findIndex((s) => !sliceIsZero(s));
  return sliceWeight(f.slices[i]!) === 1;
}

/** The single term c·ζ^e of a monomial slice. */
function monomialTerm(s: Slice): { e: readonly number[]; c: Int } {
  let out: { e: readonly number[]; c: Int } | null = null;
  forEachTerm(s, (e, c) => (out = { e, c }));
  return out!;
}

/** f^k for an integer k by Miller's recurrence; f must have a monomial lowest slice. */
export function powerMiller(f: QZSeries, k: number): QZSeries {
  const v = leadingExponent(f);
  if (v === null || !hasMonomialLead(f)) throw new RangeError('internal: Miller recurrence needs a monomial leading slice');
  const lead = f.slices.findIndex((s) => !sliceIsZero(s));
  // g = f / q^v has a_0 as its slice 0; f^k = q^(kv) · g^k, and g^k is exact as far as g is.
  const a = f.slices.slice(lead);
  const X = rsub(f.exactTo, v);
  const n = sliceCountTo(rat(0), f.qDen, X);
  const a0 = monomialTerm(a[0]!);
  const fast = JSBI.equal(f.den, ONE) && JSBI.equal(JSBI.multiply(a0.c, a0.c), ONE);
  if (!fast && f.nvars > 1) throw new RangeError('internal: Miller recurrence over rationals needs one variable');
  const h = fast
    ? scalarSlices(a)
      ? millerScalar(a, a0.c, k, n)
      : millerIntegral(a, a0, k, n)
    : millerRational(a.map(dense), f.den, k, n);
  return shiftSeries(makeSeries(rat(0), f.qDen, h.den, h.slices, X, f.nvars), rmul(v, rat(k)));
}

interface Numerators {
  readonly den: Int;
  readonly slices: Slice[];
}

/** Whether every slice is a constant (a q-series with no ζ): the scalar fast path applies. */
function scalarSlices(a: readonly Slice[]): boolean {
  return a.every((s) => !isSparse(s) && (s.c.length === 0 || (s.lo === 0 && s.c.length === 1)));
}

/**
 * The integral recurrence on a q-series: numerators only, no slice objects. With
 * a_j = ±1 (pentagonal sums) the products are additions; the factor (k+1)j − m is
 * applied once per term.
 */
function millerScalar(a: readonly Slice[], c0: Int, k: number, n: number): Numerators {
  const coef = (j: number): Int => {
    const s = a[j];
    return s === undefined || sliceIsZero(s) ? ZERO : (s as DenseSlice).c[0]!;
  };
  const support: number[] = [];
  const values: Int[] = [];
  for (let j = 1; j < Math.min(n, a.length); j++) {
    const c = coef(j);
    if (!isZero(c)) {
      support.push(j);
      values.push(c);
    }
  }
  const h: Int[] = new Array<Int>(n).fill(ZERO);
  if (n === 0) return { den: ONE, slices: [] };
  h[0] = JSBI.equal(c0, ONE) || k % 2 === 0 ? ONE : int(-1);
  for (let m = 1; m < n; m++) {
    let acc = ZERO;
    for (let t = 0; t < support.length; t++) {
      const j = support[t]!;
      if (j > m) break;
      const w = (k + 1) * j - m;
      const hv = h[m - j]!;
      if (w === 0 || isZero(hv)) continue;
      const c = values[t]!;
      const term = JSBI.multiply(hv, int(w));
      acc = JSBI.equal(c, ONE) ? JSBI.add(acc, term) : JSBI.equal(c, MINUS_ONE) ? JSBI.subtract(acc, term) : JSBI.add(acc, JSBI.multiply(term, c));
    }
    const divisor = JSBI.multiply(int(m), c0);
    const q = JSBI.divide(acc, divisor);
    if (!JSBI.equal(JSBI.multiply(q, divisor), acc)) throw new RangeError('internal: inexact Miller step');
    h[m] = q;
  }
  return { den: ONE, slices: h.map((v) => (isZero(v) ? EMPTY_SLICE : { lo: 0, c: [v] })) };
}

/** The integral recurrence, on slices of any number of variables. */
function millerIntegral(a: readonly Slice[], a0: { e: readonly number[]; c: Int }, k: number, n: number): Numerators {
  const h: Slice[] = new Array<Slice>(n).fill(EMPTY_SLICE);
  if (n === 0) return { den: ONE, slices: h };
  const c0k = JSBI.equal(a0.c, ONE) || k % 2 === 0 ? ONE : int(-1);
  h[0] = sliceShift(sliceIsZero(a[0]!) ? a[0]! : sliceScale(sliceDivideBy(a[0]!, a0.c), c0k), a0.e.map((x) => x * (k - 1)));
  const minusE0 = a0.e.map((x) => -x);
  const support: number[] = [];
  for (let j = 1; j < Math.min(n, a.length); j++) if (!sliceIsZero(a[j]!)) support.push(j);
  for (let m = 1; m < n; m++) {
    let acc: Slice = EMPTY_SLICE;
    for (const j of support) {
      if (j > m) break;
      const w = (k + 1) * j - m;
      if (w === 0 || sliceIsZero(h[m - j]!)) continue;
      acc = sliceCombine(acc, null, sliceMultiply(a[j]!, h[m - j]!), int(w));
    }
    const divisor = JSBI.multiply(int(m), a0.c);
    forEachTerm(acc, (_e, x) => {
      if (!JSBI.equal(JSBI.multiply(JSBI.divide(x, divisor), divisor), x)) throw new RangeError('internal: inexact Miller step');
    });
    h[m] = sliceShift(sliceDivideBy(acc, divisor), minusE0);
  }
  return { den: ONE, slices: h };
}

/** The same recurrence with rational coefficients (rare: non-monic or non-integral f). */
function millerRational(a: readonly DenseSlice[], den: Int, k: number, n: number): Numerators {
  const toR = (s: DenseSlice): Map<number, Rational> => {
    const m = new Map<number, Rational>();
    s.c.forEach((x, i) => {
      if (!isZero(x)) m.set(s.lo + i, rational(x, den));
    });
    return m;
  };
  const ar = a.slice(0, n).map(toR);
  const [[e0, c0]] = [...ar[0]!.entries()] as [number, Rational][];
  const h: Map<number, Rational>[] = [];
  if (n > 0) h.push(new Map([[e0 * k, rpow(c0, k)]]));
  for (let m = 1; m < n; m++) {
    const acc = new Map<number, Rational>();
    for (let j = 1; j <= m && j < ar.length; j++) {
      const w = (k + 1) * j - m;
      if (w === 0) continue;
      for (const [e1, x] of ar[j]!) {
        for (const [e2, y] of h[m - j]!) {
          const e = e1 + e2;
          acc.set(e, radd(acc.get(e) ?? rat(0), rmul(rat(w), rmul(x, y))));
        }
      }
    }
    const hm = new Map<number, Rational>();
    const scale = rmul(rat(m), c0);
    for (const [e, x] of acc) if (!rIsZero(x)) hm.set(e - e0, rdiv(x, scale));
    h.push(hm);
  }
  return slicesFromRationalRows(h);
}
