/**
 * One q-slice of a series: the Laurent polynomial in ζ multiplying one power of q.
 * ζ-exponents are half-integral (MATH.md §1) and stored in units of ½.
 *
 * - One variable is the dense fast path (`DenseSlice`): a run of integer numerators
 *   `c` whose first entry is the coefficient of ζ^(lo/2); trimmed, so `c` is empty or
 *   starts and ends with a non-zero.
 * - Several variables use `SparseSlice`: the non-zero terms, each an exponent vector
 *   (halves) and a numerator, in no particular order.
 *
 * Every operation the series layer needs on slices lives here and dispatches on the
 * kind; algorithms written for one variable ask for dense slices explicitly.
 */
import { JSBI, type Int, ZERO, ONE, isZero } from './integer.js';

export interface DenseSlice {
  readonly kind?: undefined;
  /** ζ-exponent of c[0], in units of ½. */
  readonly lo: number;
  readonly c: readonly Int[];
}

export interface SparseSlice {
  readonly kind: 'sparse';
  /** Number of variables. */
  readonly n: number;
  /** Exponent vectors (halves), one per term. */
  readonly exps: readonly (readonly number[])[];
  /** Non-zero numerators, parallel to exps. */
  readonly vals: readonly Int[];
}

export type Slice = DenseSlice | SparseSlice;

export const EMPTY_SLICE: DenseSlice = { lo: 0, c: [] };

export function isSparse(s: Slice): s is SparseSlice {
  return s.kind === 'sparse';
}

/** The slice as a dense one-variable slice; the caller guarantees one variable. */
export function dense(s: Slice): DenseSlice {
  if (isSparse(s)) {
    if (s.vals.length === 0) return EMPTY_SLICE;
    throw new RangeError('internal: a one-variable algorithm met a several-variable slice');
  }
  return s;
}

/** Drops zero numerators at both ends; returns EMPTY_SLICE when nothing is left. */
export function trimSlice(lo: number, c: Int[]): DenseSlice {
  let a = 0;
  let b = c.length;
  while (a < b && isZero(c[a]!)) a++;
  while (b > a && isZero(c[b - 1]!)) b--;
  if (a === b) return EMPTY_SLICE;
  return { lo: lo + a, c: a === 0 && b === c.length ? c : c.slice(a, b) };
}

export function sliceIsZero(s: Slice): boolean {
  return isSparse(s) ? s.vals.length === 0 : s.c.length === 0;
}

/** Highest ζ-exponent (halves) of a non-zero dense slice. */
export function sliceHi(s: DenseSlice): number {
  return s.lo + s.c.length - 1;
}

/** Number of non-zero numerators. */
export function sliceWeight(s: Slice): number {
  if (isSparse(s)) return s.vals.length;
  let n = 0;
  for (const x of s.c) if (!isZero(x)) n++;
  return n;
}

/** Calls f for every stored term with its exponent vector (halves). */
export function forEachTerm(s: Slice, f: (e: readonly number[], v: Int) => void): void {
  if (isSparse(s)) {
    for (let i = 0; i < s.vals.length; i++) f(s.exps[i]!, s.vals[i]!);
    return;
  }
  for (let k = 0; k < s.c.length; k++) if (!isZero(s.c[k]!)) f([s.lo + k], s.c[k]!);
}

export function vectorKey(e: readonly number[]): string {
  return e.join(',');
}

/** Builds a sparse slice from a key → (vector, value) accumulator, dropping zeros. */
function sparseFrom(n: number, acc: Map<string, { e: readonly number[]; v: Int }>): SparseSlice {
  const exps: (readonly number[])[] = [];
  const vals: Int[] = [];
  for (const { e, v } of acc.values()) {
    if (!isZero(v)) {
      exps.push(e);
      vals.push(v);
    }
  }
  return { kind: 'sparse', n, exps, vals };
}

function accumulate(acc: Map<string, { e: readonly number[]; v: Int }>, e: readonly number[], v: Int): void {
  const k = vectorKey(e);
  const prev = acc.get(k);
  acc.set(k, prev === undefined ? { e, v } : { e: prev.e, v: JSBI.add(prev.v, v) });
}

/** A sparse slice from parallel lists (zero values dropped, equal vectors added). */
export function sparseSlice(n: number, exps: readonly (readonly number[])[], vals: readonly Int[]): SparseSlice {
  const acc = new Map<string, { e: readonly number[]; v: Int }>();
  for (let i = 0; i < vals.length; i++) accumulate(acc, exps[i]!, vals[i]!);
  return sparseFrom(n, acc);
}

export function sliceCoefficient(s: Slice, e: number | readonly number[]): Int {
  if (isSparse(s)) {
    const key = typeof e === 'number' ? String(e) : vectorKey(e);
    for (let i = 0; i < s.vals.length; i++) if (vectorKey(s.exps[i]!) === key) return s.vals[i]!;
    return ZERO;
  }
  const k = (typeof e === 'number' ? e : e[0]!) - s.lo;
  return k >= 0 && k < s.c.length ? s.c[k]! : ZERO;
}

function times(v: Int, x: Int | null): Int {
  return x === null ? v : JSBI.multiply(v, x);
}

/** x·a + y·b for integer scalars x, y (either may be null to mean 1). */
export function sliceCombine(a: Slice, x: Int | null, b: Slice, y: Int | null): Slice {
  if (sliceIsZero(a)) return sliceScale(b, y);
  if (sliceIsZero(b)) return sliceScale(a, x);
  if (isSparse(a) || isSparse(b)) {
    const n = isSparse(a) ? a.n : (b as SparseSlice).n;
    const acc = new Map<string, { e: readonly number[]; v: Int }>();
    forEachTerm(a, (e, v) => accumulate(acc, e, times(v, x)));
    forEachTerm(b, (e, v) => accumulate(acc, e, times(v, y)));
    return sparseFrom(n, acc);
  }
  const lo = Math.min(a.lo, b.lo);
  const hi = Math.max(sliceHi(a), sliceHi(b));
  const out: Int[] = new Array<Int>(hi - lo + 1).fill(ZERO);
  for (let i = 0; i < a.c.length; i++) out[a.lo - lo + i] = times(a.c[i]!, x);
  for (let i = 0; i < b.c.length; i++) {
    const v = b.c[i]!;
    if (isZero(v)) continue;
    const k = b.lo - lo + i;
    out[k] = JSBI.add(out[k]!, times(v, y));
  }
  return trimSlice(lo, out);
}

export function sliceScale(a: Slice, x: Int | null): Slice {
  if (x === null || sliceIsZero(a)) return a;
  if (isZero(x)) return EMPTY_SLICE;
  if (isSparse(a)) return { ...a, vals: a.vals.map((v) => JSBI.multiply(v, x)) };
  return { lo: a.lo, c: a.c.map((v) => JSBI.multiply(v, x)) };
}

/** Exact quotient of every numerator by an integer that divides them all. */
export function sliceDivideBy(a: Slice, d: Int): Slice {
  if (isSparse(a)) return { ...a, vals: a.vals.map((v) => JSBI.divide(v, d)) };
  return { lo: a.lo, c: a.c.map((v) => JSBI.divide(v, d)) };
}

/** Laurent-polynomial product a·b (schoolbook, zeros skipped). */
export function sliceMultiply(a: Slice, b: Slice): Slice {
  if (sliceIsZero(a) || sliceIsZero(b)) return EMPTY_SLICE;
  if (isSparse(a) || isSparse(b)) {
    const n = isSparse(a) ? a.n : (b as SparseSlice).n;
    const acc = new Map<string, { e: readonly number[]; v: Int }>();
    forEachTerm(a, (ea, va) =>
      forEachTerm(b, (eb, vb) =>
        accumulate(
          acc,
          ea.map((x, i) => x + eb[i]!),
          JSBI.multiply(va, vb),
        ),
      ),
    );
    return sparseFrom(n, acc);
  }
  const out: Int[] = new Array<Int>(a.c.length + b.c.length - 1).fill(ZERO);
  sliceMultiplyInto(out, 0, a, b);
  return trimSlice(a.lo + b.lo, out);
}

/** acc[off + i + j] += a[i]·b[j] for dense slices; the caller owns `acc`. */
export function sliceMultiplyInto(acc: Int[], off: number, a: DenseSlice, b: DenseSlice): void {
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

/**
 * The linear substitution of variables: with w = A·z (A an m×n integer matrix, m the
 * slice's variables, n the new ones), ζ_w^ℓ = e(ℓ·Az) = ζ_z^{Aᵀℓ}. Terms that land on
 * the same exponent are added; the result is dense when n = 1.
 */
export function sliceSubstituteLinear(s: Slice, A: readonly (readonly number[])[]): Slice {
  if (sliceIsZero(s)) return EMPTY_SLICE;
  const n = A[0]!.length;
  if (n === 1 && !isSparse(s) && A.length === 1) return sliceSubstitute(s, A[0]![0]!);
  const mapped = (e: readonly number[]): number[] => {
    const out = new Array<number>(n).fill(0);
    for (let i = 0; i < e.length; i++) {
      const ei = e[i]!;
      if (ei === 0) continue;
      const row = A[i]!;
      for (let j = 0; j < n; j++) out[j] += row[j]! * ei;
    }
    return out;
  };
  if (n === 1) {
    const acc = new Map<number, Int>();
    forEachTerm(s, (e, v) => {
      const k = mapped(e)[0]!;
      acc.set(k, JSBI.add(acc.get(k) ?? ZERO, v));
    });
    const keys = [...acc.keys()];
    const lo = Math.min(...keys);
    const c: Int[] = new Array<Int>(Math.max(...keys) - lo + 1).fill(ZERO);
    for (const [k, v] of acc) c[k - lo] = v;
    return trimSlice(lo, c);
  }
  const accumulated = new Map<string, { e: readonly number[]; v: Int }>();
  forEachTerm(s, (e, v) => accumulate(accumulated, mapped(e), v));
  return sparseFrom(n, accumulated);
}

/** ζ^(e/2) ↦ ζ^(a·e/2) on a dense slice; a = 0 evaluates at ζ = 1 (z ↦ 0). */
export function sliceSubstitute(s: Slice, a: number): Slice {
  if (sliceIsZero(s)) return EMPTY_SLICE;
  const d = dense(s);
  if (a === 0) {
    let t = ZERO;
    for (const v of d.c) t = JSBI.add(t, v);
    return trimSlice(0, [t]);
  }
  if (a === 1) return d;
  const n = d.c.length;
  const out: Int[] = new Array<Int>((n - 1) * Math.abs(a) + 1).fill(ZERO);
  const lo = a > 0 ? d.lo * a : sliceHi(d) * a;
  for (let i = 0; i < n; i++) out[(d.lo + i) * a - lo] = d.c[i]!;
  return trimSlice(lo, out);
}

/** Multiplies the coefficient of ζ^(e/2) by w(e) (an integer weight per exponent vector). */
export function sliceWeighted(s: Slice, w: (e: readonly number[]) => Int): Slice {
  if (isSparse(s)) {
    const exps: (readonly number[])[] = [];
    const vals: Int[] = [];
    for (let i = 0; i < s.vals.length; i++) {
      const v = JSBI.multiply(s.vals[i]!, w(s.exps[i]!));
      if (!isZero(v)) {
        exps.push(s.exps[i]!);
        vals.push(v);
      }
    }
    return { kind: 'sparse', n: s.n, exps, vals };
  }
  const out: Int[] = s.c.map((v, i) => (isZero(v) ? v : JSBI.multiply(v, w([s.lo + i]))));
  return trimSlice(s.lo, out);
}

/** Shifts every ζ-exponent by the vector d (halves): multiplication by ζ^(d/2). */
export function sliceShift(s: Slice, d: readonly number[]): Slice {
  if (sliceIsZero(s)) return s;
  if (isSparse(s)) return { ...s, exps: s.exps.map((e) => e.map((x, i) => x + d[i]!)) };
  return { lo: s.lo + d[0]!, c: s.c };
}

/**
 * Exact Laurent-polynomial division a / b of dense slices, or null when b does not
 * divide a. Requires the lowest coefficient of b to be ±1 (theta blocks satisfy
 * this), so the quotient of integer numerators stays integral.
 */
export function sliceDivideExact(a: Slice, b: Slice): Slice | null {
  if (sliceIsZero(b)) throw new RangeError('slice division by zero');
  if (sliceIsZero(a)) return EMPTY_SLICE;
  if (isSparse(a) || isSparse(b)) return sparseDivideExact(a, b);
  const lead = b.c[0]!;
  const unit = JSBI.equal(lead, ONE) ? 1 : JSBI.equal(lead, JSBI.unaryMinus(ONE)) ? -1 : 0;
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

/** Lexicographic order of exponent vectors (the tie-break of CLAIMS.md's term order). */
export function lexCompare(x: readonly number[], y: readonly number[]): number {
  for (let i = 0; i < x.length; i++) if (x[i] !== y[i]) return x[i]! - y[i]!;
  return 0;
}

/**
 * Exact division of several-variable Laurent polynomials: long division in the
 * lexicographic order of exponent vectors (compatible with addition), by a divisor
 * whose lexicographically highest coefficient is ±1. If a = q·b then Newt(a) =
 * Newt(q) + Newt(b), so every exponent of q lies in the box min_i(a) − min_i(b) ≤ t_i ≤
 * max_i(a) − max_i(b); a quotient term outside it proves b ∤ a. Each step lowers the
 * remainder's top strictly inside that finite box, so the division terminates.
 */
function sparseDivideExact(a: Slice, b: Slice): Slice | null {
  const n = isSparse(a) ? a.n : (b as SparseSlice).n;
  const bTerms: { e: readonly number[]; v: Int }[] = [];
  forEachTerm(b, (e, v) => bTerms.push({ e, v }));
  bTerms.sort((x, y) => lexCompare(y.e, x.e));
  const lead = bTerms[0]!;
  const unit = JSBI.equal(lead.v, ONE) ? 1 : JSBI.equal(lead.v, JSBI.unaryMinus(ONE)) ? -1 : 0;
  if (unit === 0) throw new RangeError('slice division needs a divisor with leading coefficient ±1');
  const lo = new Array<number>(n).fill(Infinity);
  const hi = new Array<number>(n).fill(-Infinity);
  const rem = new Map<string, { e: readonly number[]; v: Int }>();
  forEachTerm(a, (e, v) => {
    accumulate(rem, e, v);
    e.forEach((x, i) => {
      lo[i] = Math.min(lo[i]!, x);
      hi[i] = Math.max(hi[i]!, x);
    });
  });
  const bMin = bTerms[0]!.e.map((_, i) => Math.min(...bTerms.map((t) => t.e[i]!)));
  const bMax = bTerms[0]!.e.map((_, i) => Math.max(...bTerms.map((t) => t.e[i]!)));
  const quotient = new Map<string, { e: readonly number[]; v: Int }>();
  for (;;) {
    let top: { e: readonly number[]; v: Int } | null = null;
    for (const t of rem.values()) if (!isZero(t.v) && (top === null || lexCompare(t.e, top.e) > 0)) top = t;
    if (top === null) break;
    const qe = top.e.map((x, i) => x - lead.e[i]!);
    if (qe.some((x, i) => x < lo[i]! - bMin[i]! || x > hi[i]! - bMax[i]!)) return null;
    const qv = unit === 1 ? top.v : JSBI.unaryMinus(top.v);
    accumulate(quotient, qe, qv);
    for (const t of bTerms) accumulate(rem, t.e.map((x, i) => x + qe[i]!), JSBI.unaryMinus(JSBI.multiply(qv, t.v)));
  }
  return sparseFrom(n, quotient);
}

/** gcd of all numerators folded into g. */
export function sliceContentGcd(s: Slice, g: Int, gcd: (a: Int, b: Int) => Int): Int {
  let r = g;
  const vals = isSparse(s) ? s.vals : s.c;
  for (const v of vals) {
    if (isZero(v)) continue;
    r = gcd(r, v);
    if (JSBI.equal(r, ONE)) return r;
  }
  return r;
}

/** Whether exact division by this slice keeps integers: its leading coefficient is ±1. */
export function hasUnitLead(s: Slice): boolean {
  if (sliceIsZero(s)) return false;
  let lead: Int;
  if (isSparse(s)) {
    let best = 0;
    for (let i = 1; i < s.vals.length; i++) if (lexCompare(s.exps[i]!, s.exps[best]!) > 0) best = i;
    lead = s.vals[best]!;
  } else lead = s.c[0]!;
  return JSBI.equal(JSBI.multiply(lead, lead), ONE);
}
