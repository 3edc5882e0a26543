/**
 * Majorants per block of slices (MATH.md §8). Exponents are cut into blocks of h
 * integral q-steps, block j holding the exponents in [j·h, (j+1)·h); a majorant bounds,
 * for every block up to the q-order X, the sum of |c(x, ℓ)| over its exponents x ≤ X
 * and all ℓ. Every single coefficient is then at most its block's bound. The rules:
 * - product: a term of fg in block k is c_f(a)·c_g(b) with a in block i, b in block j,
 *   i + j ∈ {k − 1, k}, so M_fg(k) ≤ Σ_{i+j=k} M_f(i)M_g(j) + Σ_{i+j=k−1} M_f(i)M_g(j);
 * - power: the product rule k − 1 times (by squaring);
 * - sum: M_{Σaᵢfᵢ} ≤ Σ|aᵢ|·M_{fᵢ}.
 * Blocks keep the convolution cost at (number of blocks)² whatever the length; one
 * block per q-step when the series is short. Bounds are stored as doubles ≤ 1 times
 * 2^scale; every operation rounds up by a relative margin, and non-zero entries are
 * kept ≥ 2^−500 so no product of two of them underflows (raising a bound is sound).
 *
 * `den` is a D with D·c integral for every coefficient (so D·max M bounds the numerators
 * the residues must recover); `avoid` is an integer every prime must not divide: the
 * product of every denominator met on the way (MATH.md §8).
 */
import { JSBI, type Int, ONE, lcm, abs, isZero } from '../integer.js';
import { type Rational, rfloor, rdiv, rat, rsub, rcmp, radd, rmul } from '../rational.js';
import { bitLength } from '../modular/multi-modular-product.js';
import { bySquaring } from './by-squaring.js';

export interface Majorant {
  /** Block length in integral q-steps. */
  readonly h: number;
  /** Block index of m[0]. */
  readonly first: number;
  /** Block bounds over 2^scale, in [0, 1]; zero only where the series has no terms. */
  readonly m: Float64Array;
  readonly scale: number;
  readonly den: Int;
  readonly avoid: Int;
  /**
   * Known when h = 1 and every exponent is offset + an integer, 0 ≤ offset < 1: a block
   * then holds one exponent, and a product's terms fall in one block, not two.
   */
  readonly offset?: Rational;
}

/** m with the offset of exponents x + ℤ, when blocks are single q-steps. */
export function withOffset(m: Majorant, x: Rational): Majorant {
  return m.h === 1 ? { ...m, offset: rsub(x, rat(JSBI.toNumber(rfloor(x)))) } : m;
}

/** Relative margin for rounding; far above double rounding (2^-52 per step, ≤ 2^16 terms per sum). */
const MARGIN = 1e-9;
const FLOOR = 2 ** -500;

export function up(x: number): number {
  return x + Math.abs(x) * MARGIN + 1e-9;
}

/** log₂ of an upper bound of a non-negative integer (−∞ for 0). */
export function log2UpperInt(x: Int): number {
  if (isZero(x)) return -Infinity;
  const n = Math.abs(JSBI.toNumber(x));
  if (Number.isFinite(n) && n < 2 ** 1000) return up(Math.log2(n));
  return bitLength(abs(x));
}

/** log₂ of a lower bound of a positive integer. */
export function log2LowerInt(x: Int): number {
  const n = Math.abs(JSBI.toNumber(x));
  if (Number.isFinite(n) && n < 2 ** 1000) return Math.log2(n) * (1 - MARGIN) - 1e-9;
  return bitLength(abs(x)) - 2;
}

/** log₂|r| rounded up (−∞ for 0). */
export function log2UpperRational(r: { num: Int; den: Int }): number {
  if (isZero(r.num)) return -Infinity;
  return up(log2UpperInt(r.num) - log2LowerInt(r.den));
}

/** The block holding exponent x. */
export function blockOf(x: Rational, h: number): number {
  return JSBI.toNumber(rfloor(rdiv(x, rat(h))));
}

/** A majorant from log₂ block bounds (−∞ for an empty block). */
export function majorantFromLog2(h: number, first: number, log2: readonly number[], den: Int = ONE, avoid: Int = den): Majorant {
  let scale = -Infinity;
  for (const l of log2) scale = Math.max(scale, l);
  const m = new Float64Array(log2.length);
  if (scale === -Infinity) return { h, first, m, scale: 0, den, avoid };
  scale = up(scale);
  for (let j = 0; j < log2.length; j++) {
    const l = log2[j]!;
    if (l === -Infinity) continue;
    m[j] = Math.min(1, Math.max(FLOOR, 2 ** (l - scale) * (1 + MARGIN)));
  }
  return { h, first, m, scale, den, avoid };
}

/** An empty majorant (no terms up to the order asked). */
export function zeroMajorant(h: number, first = 0): Majorant {
  return { h, first, m: new Float64Array(0), scale: 0, den: ONE, avoid: ONE };
}

/** Rescales so the largest entry is 1, rounding up; keeps the floor on non-zero entries. */
function normalised(h: number, first: number, raw: Float64Array, scale: number, den: Int, avoid: Int, offset?: Rational): Majorant {
  const known = offset === undefined ? {} : { offset };
  let max = 0;
  for (let j = 0; j < raw.length; j++) max = Math.max(max, raw[j]!);
  if (max === 0) return { h, first, m: raw, scale: 0, den, avoid, ...known };
  const e = Math.floor(Math.log2(max));
  const f = 2 ** -e;
  for (let j = 0; j < raw.length; j++) {
    const x = raw[j]!;
    if (x === 0) continue;
    raw[j] = Math.max(FLOOR, x * f * (1 + MARGIN));
  }
  let top = 0;
  for (let j = 0; j < raw.length; j++) top = Math.max(top, raw[j]!);
  // x·2^−e < 2 (up to rounding): divide by 2 once more if needed to stay ≤ 1
  if (top > 1) for (let j = 0; j < raw.length; j++) raw[j] = raw[j]! === 0 ? 0 : Math.max(FLOOR, (raw[j]! / 2) * (1 + MARGIN));
  return { h, first, m: raw, scale: up(scale + e + (top > 1 ? 1 : 0)), den, avoid, ...known };
}

/** Blocks up to `last` only. */
function cut(m: Float64Array, first: number, last: number): Float64Array {
  const n = Math.max(0, Math.min(m.length, last - first + 1));
  return n === m.length ? m : m.slice(0, n);
}

function convolve(a: Majorant, b: Majorant, last: number): Majorant {
  if (a.h !== b.h) throw new RangeError('internal: majorants with different blocks');
  const first = a.first + b.first;
  const n = Math.max(0, Math.min(a.m.length + b.m.length, last - first + 1));
  const out = new Float64Array(n);
  // with known offsets a + b lies in block i + j + carry exactly; else in i + j or i + j + 1
  let offset: Rational | undefined;
  let lo = 0;
  let hi = 1;
  if (a.offset !== undefined && b.offset !== undefined) {
    const s = radd(a.offset, b.offset);
    lo = rcmp(s, rat(1)) >= 0 ? 1 : 0;
    hi = lo;
    offset = rsub(s, rat(lo));
  }
  for (let i = 0; i < a.m.length && i < n; i++) {
    const x = a.m[i]!;
    if (x === 0) continue;
    for (let j = 0; j < b.m.length && i + j < n; j++) {
      const t = x * b.m[j]!;
      if (i + j + lo < n) out[i + j + lo] += t;
      if (hi !== lo && i + j + hi < n) out[i + j + hi] += t;
    }
  }
  return normalised(a.h, first, out, up(a.scale + b.scale), JSBI.multiply(a.den, b.den), lcm(a.avoid, b.avoid), offset);
}

export interface FactorMajorant {
  readonly majorant: Majorant;
  /** A lower bound of the factor's valuation. */
  readonly valuation: Rational;
}

/**
 * The majorant of Π fᵢ to q-order X. A partial product is kept to X minus the
 * valuations of the factors still to come — beyond X when they are negative (η^−e) —
 * since its terms there still meet theirs below X.
 */
export function majorantProduct(parts: readonly FactorMajorant[], X: Rational): Majorant {
  const h = parts[0]!.majorant.h;
  let rest = rat(0);
  for (const p of parts) rest = radd(rest, p.valuation);
  let acc = parts[0]!.majorant;
  rest = rsub(rest, parts[0]!.valuation);
  for (let i = 1; i < parts.length; i++) {
    rest = rsub(rest, parts[i]!.valuation);
    acc = convolve(acc, parts[i]!.majorant, blockOf(rsub(X, rest), h));
  }
  const last = blockOf(X, h);
  return { ...acc, m: cut(acc.m, acc.first, last) };
}

/**
 * The majorant of f^k, k ≥ 1, to q-order X, v a lower bound of f's valuation: by
 * squaring, f^j kept to X − (k − j)·v (the same reason as in majorantProduct).
 */
export function majorantPower(m: Majorant, k: number, v: Rational, X: Rational): Majorant {
  const lastFor = (j: number): number => blockOf(rsub(X, rmul(v, rat(k - j))), m.h);
  const result = bySquaring(m, k, (a, b, j) => convolve(a, b, lastFor(j)));
  const last = blockOf(X, m.h);
  return { ...result, m: cut(result.m, result.first, last) };
}

export interface WeightedMajorant {
  readonly majorant: Majorant;
  readonly coefficient: { num: Int; den: Int };
}

export function majorantSum(terms: readonly WeightedMajorant[], h: number): Majorant {
  const live = terms.filter((t) => !isZero(t.coefficient.num) && t.majorant.m.length > 0);
  let den: Int = ONE;
  let avoid: Int = ONE;
  for (const { majorant: m, coefficient: a } of terms) {
    den = lcm(den, JSBI.multiply(m.den, a.den));
    avoid = lcm(lcm(avoid, m.avoid), a.den);
  }
  if (live.length === 0) return { ...zeroMajorant(h), den, avoid };
  let first = Infinity;
  let end = -Infinity;
  let scale = -Infinity;
  for (const { majorant: m, coefficient: a } of live) {
    first = Math.min(first, m.first);
    end = Math.max(end, m.first + m.m.length);
    scale = Math.max(scale, up(m.scale + log2UpperRational(a)));
  }
  const out = new Float64Array(end - first);
  for (const { majorant: m, coefficient: a } of live) {
    const f = 2 ** (up(m.scale + log2UpperRational(a)) - scale);
    for (let j = 0; j < m.m.length; j++) {
      const x = m.m[j]!;
      if (x !== 0) out[m.first - first + j] += Math.max(FLOOR, x * f);
    }
  }
  const o = live[0]!.majorant.offset;
  const same = o !== undefined && live.every((t) => t.majorant.offset !== undefined && rcmp(t.majorant.offset, o) === 0);
  return normalised(h, first, out, scale, den, avoid, same ? o : undefined);
}

/** log₂ of the largest block bound (−∞ when there are no terms). */
export function majorantMaxLog2(m: Majorant): number {
  let max = 0;
  for (let j = 0; j < m.m.length; j++) max = Math.max(max, m.m[j]!);
  return max === 0 ? -Infinity : up(m.scale + Math.log2(max));
}

/** The bits b of the height bound 2^b ≥ D·max M that the residues must recover. */
export function heightBits(m: Majorant): number {
  return heightBitsOf(majorantMaxLog2(m), m.den);
}

/** ⌈log₂(D·2^l)⌉, rounded up; 0 when there are no terms. */
export function heightBitsOf(log2Max: number, den: Int): number {
  if (log2Max === -Infinity) return 0;
  return Math.max(0, Math.ceil(up(log2Max + log2UpperInt(den))));
}


/** Number of blocks a majorant aims at: convolutions cost its square (≈ 6·10⁴ multiply-adds). */
export const MAJORANT_BLOCKS = 256;

/** The block length for an expansion from valuation v to q-order X. */
export function majorantBlockLength(X: Rational, v: Rational): number {
  const steps = JSBI.toNumber(rfloor(rsub(X, v))) + 1;
  return Math.max(1, Math.ceil(steps / MAJORANT_BLOCKS));
}

/**
 * A majorant from a non-decreasing bound C(x) of the cumulative sum Σ_{exponent ≤ x}
 * |c|: each block is bounded by C at its end (or at X), since a block's sum is at most
 * the cumulative sum through it.
 */
export function majorantFromCumulative(h: number, v: Rational, X: Rational, log2C: (x: Rational) => number, den: Int = ONE): Majorant {
  const first = blockOf(v, h);
  const last = blockOf(X, h);
  const out: number[] = [];
  for (let j = first; j <= last; j++) {
    const end = rat((j + 1) * h);
    out.push(log2C(rcmp(end, X) < 0 ? end : X));
  }
  return withOffset(majorantFromLog2(h, first, out, den, den), v);
}
