/** Test helpers: reading coefficients of series as strings. */
import {
  type QZSeries,
  type Rational,
  coefficientAt,
  forEachTerm,
  rat,
  radd,
  rational,
  rationalToString,
  sliceAtExponent,
} from '../../src/series/index.js';

/** The coefficient of q^x ζ^(e/2) as "a" or "a/b". */
export function coef(s: QZSeries, x: Rational | number, halves = 0): string {
  const xr = typeof x === 'number' ? rat(x) : x;
  return rationalToString(coefficientAt(s, xr, halves));
}

/** The ζ⁰ coefficients at q^(start + i), i = 0..n−1, as strings. */
export function qCoefficients(s: QZSeries, n: number, start: Rational = s.start): string[] {
  const out: string[] = [];
  for (let i = 0; i < n; i++) out.push(rationalToString(coefficientAt(s, radd(start, rat(i)), 0)));
  return out;
}

/** The slice of q^x as { ζ-exponent in halves: coefficient }, zeros omitted. */
export function sliceAt(s: QZSeries, x: Rational | number): Record<number, string> {
  const xr = typeof x === 'number' ? rat(x) : x;
  const sl = sliceAtExponent(s, xr);
  const out: Record<number, string> = {};
  forEachTerm(sl, (e, v) => {
    out[e[0]!] = rationalToString(rational(v, s.den));
  });
  return out;
}
