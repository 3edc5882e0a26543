/**
 * Exact integers for the series engine: JSBI values plus the few helpers every
 * layer needs (gcd, small constants, conversions). Native `bigint` is not used:
 * the project card asks for JSBI wherever it can serve.
 */
import JSBIModule from 'jsbi';

/**
 * jsbi ships `module.exports = JSBI` with a declaration file saying `export default`;
 * under NodeNext the default import is therefore typed as the module while at run
 * time it is the class itself. This cast restores the run-time truth once, here.
 */
type JSBIClass = typeof JSBIModule.default;
export const JSBI = JSBIModule as unknown as JSBIClass;
export type Int = import('jsbi').default;
export const ZERO: Int = JSBI.BigInt(0);
export const ONE: Int = JSBI.BigInt(1);
export const MINUS_ONE: Int = JSBI.BigInt(-1);

const SMALL: Int[] = [];
for (let i = -64; i <= 64; i++) SMALL.push(JSBI.BigInt(i));

/** A JSBI from a safe integer, sharing the small ones. */
export function int(n: number): Int {
  if (n >= -64 && n <= 64 && Number.isInteger(n)) return SMALL[n + 64]!;
  if (!Number.isSafeInteger(n)) throw new RangeError(`not a safe integer: ${n}`);
  return JSBI.BigInt(n);
}

/** A JSBI from a decimal string (optionally signed). */
export function intFromString(s: string): Int {
  return JSBI.BigInt(s);
}

export function isZero(a: Int): boolean {
  return JSBI.equal(a, ZERO);
}

export function sign(a: Int): number {
  return JSBI.lessThan(a, ZERO) ? -1 : JSBI.greaterThan(a, ZERO) ? 1 : 0;
}

export function abs(a: Int): Int {
  return JSBI.lessThan(a, ZERO) ? JSBI.unaryMinus(a) : a;
}

export function gcd(a: Int, b: Int): Int {
  let x = abs(a);
  let y = abs(b);
  while (!isZero(y)) {
    const t = JSBI.remainder(x, y);
    x = y;
    y = t;
  }
  return x;
}

export function lcm(a: Int, b: Int): Int {
  if (isZero(a) || isZero(b)) return ZERO;
  return abs(JSBI.multiply(JSBI.divide(a, gcd(a, b)), b));
}

export function isOne(a: Int): boolean {
  return JSBI.equal(a, ONE);
}

/** Conversion to a JS number, exact only for safe integers (callers check). */
export function toNumber(a: Int): number {
  return JSBI.toNumber(a);
}

export function isSafe(a: Int): boolean {
  const n = JSBI.toNumber(a);
  return Number.isSafeInteger(n);
}

/** Non-negative remainder of a number (MATH.md §8: `-1 % 4 === -1` in JavaScript). */
export function mod(a: number, m: number): number {
  const r = a % m;
  return r < 0 ? r + m : r;
}

/** gcd of two safe integers. */
export function gcdNumber(a: number, b: number): number {
  let x = Math.abs(a);
  let y = Math.abs(b);
  while (y !== 0) {
    const t = x % y;
    x = y;
    y = t;
  }
  return x;
}

export function lcmNumber(a: number, b: number): number {
  if (a === 0 || b === 0) return 0;
  const l = (Math.abs(a) / gcdNumber(a, b)) * Math.abs(b);
  if (!Number.isSafeInteger(l)) throw new RangeError(`lcm overflow: ${a}, ${b}`);
  return l;
}


/** ⌊√n⌋ for a safe integer n ≥ 0, corrected after the floating-point estimate. */
export function isqrt(n: number): number {
  let r = Math.floor(Math.sqrt(n));
  while (r * r > n) r--;
  while ((r + 1) * (r + 1) <= n) r++;
  return r;
}
