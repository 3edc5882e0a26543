/**
 * Exact rational numbers over JSBI, always reduced with a positive denominator.
 * Used for single coefficients, exponents and constants; series keep one common
 * denominator instead (ARCHITECTURE.md, the series engine).
 */
import { JSBI, type Int, ZERO, ONE, int, gcd, isZero, sign, abs, intFromString } from './integer.js';

export interface Rational {
  readonly num: Int;
  readonly den: Int;
}

export function rational(num: Int | number, den: Int | number = ONE): Rational {
  const n = typeof num === 'number' ? int(num) : num;
  const d = typeof den === 'number' ? int(den) : den;
  if (isZero(d)) throw new RangeError('rational with zero denominator');
  if (isZero(n)) return { num: ZERO, den: ONE };
  const g = gcd(n, d);
  let rn = JSBI.divide(n, g);
  let rd = JSBI.divide(d, g);
  if (sign(rd) < 0) {
    rn = JSBI.unaryMinus(rn);
    rd = JSBI.unaryMinus(rd);
  }
  return { num: rn, den: rd };
}

export const RZERO: Rational = { num: ZERO, den: ONE };
export const RONE: Rational = { num: ONE, den: ONE };

/** Parses `a`, `-a`, `a/b` (integers of any size). */
export function parseRational(text: string): Rational | undefined {
  const m = /^\s*([+-]?\d+)\s*(?:\/\s*([+-]?\d+))?\s*$/.exec(text);
  if (!m) return undefined;
  const d = m[2] === undefined ? ONE : intFromString(m[2]);
  if (isZero(d)) return undefined;
  return rational(intFromString(m[1]!), d);
}

export function radd(a: Rational, b: Rational): Rational {
  if (JSBI.equal(a.den, b.den)) return rational(JSBI.add(a.num, b.num), a.den);
  return rational(JSBI.add(JSBI.multiply(a.num, b.den), JSBI.multiply(b.num, a.den)), JSBI.multiply(a.den, b.den));
}

export function rsub(a: Rational, b: Rational): Rational {
  return radd(a, rneg(b));
}

export function rmul(a: Rational, b: Rational): Rational {
  return rational(JSBI.multiply(a.num, b.num), JSBI.multiply(a.den, b.den));
}

export function rdiv(a: Rational, b: Rational): Rational {
  if (isZero(b.num)) throw new RangeError('rational division by zero');
  return rational(JSBI.multiply(a.num, b.den), JSBI.multiply(a.den, b.num));
}

export function rneg(a: Rational): Rational {
  return { num: JSBI.unaryMinus(a.num), den: a.den };
}

export function rabs(a: Rational): Rational {
  return { num: abs(a.num), den: a.den };
}

export function rinv(a: Rational): Rational {
  return rdiv(RONE, a);
}

/** a^e for an integer e (negative allowed for a ≠ 0). */
export function rpow(a: Rational, e: number): Rational {
  if (e < 0) return rinv(rpow(a, -e));
  return rational(JSBI.exponentiate(a.num, int(e)), JSBI.exponentiate(a.den, int(e)));
}

export function rcmp(a: Rational, b: Rational): number {
  return sign(JSBI.subtract(JSBI.multiply(a.num, b.den), JSBI.multiply(b.num, a.den)));
}

export function req(a: Rational, b: Rational): boolean {
  return JSBI.equal(a.num, b.num) && JSBI.equal(a.den, b.den);
}

export function rIsZero(a: Rational): boolean {
  return isZero(a.num);
}

export function rIsInteger(a: Rational): boolean {
  return JSBI.equal(a.den, ONE);
}

export function rmin(a: Rational, b: Rational): Rational {
  return rcmp(a, b) <= 0 ? a : b;
}

export function rmax(a: Rational, b: Rational): Rational {
  return rcmp(a, b) >= 0 ? a : b;
}

/** ⌊a⌋ as a JSBI. */
export function rfloor(a: Rational): Int {
  const q = JSBI.divide(a.num, a.den);
  if (sign(a.num) < 0 && !isZero(JSBI.remainder(a.num, a.den))) return JSBI.subtract(q, ONE);
  return q;
}

/** ⌈a⌉ as a JSBI. */
export function rceil(a: Rational): Int {
  return JSBI.unaryMinus(rfloor(rneg(a)));
}

/** `a` or `a/b`, the form CLAIMS.md uses for rationals in JSON. */
export function rationalToString(a: Rational): string {
  return JSBI.equal(a.den, ONE) ? a.num.toString() : `${a.num.toString()}/${a.den.toString()}`;
}

/** A small rational from numbers, for exponents and constants in code. */
export function rat(n: number, d = 1): Rational {
  return rational(int(n), int(d));
}

/** Converts to a JS number (approximate for large values). */
export function rToNumber(a: Rational): number {
  return JSBI.toNumber(a.num) / JSBI.toNumber(a.den);
}
