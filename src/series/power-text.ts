/**
 * Powers with rational exponents as text (CLAIMS.md: reduced fractions, `q^(1/8)`,
 * `ζ^(-1/2)`, every digit shown). Anything but a non-negative integer is wrapped in
 * parentheses so that `q^(-1)` or `q^(21/2)` cannot be misread.
 */
import { type Rational, rationalToString, rIsInteger, rcmp, rat } from './rational.js';

export function powerText(base: string, e: Rational, omitOne = true): string {
  const s = rationalToString(e);
  if (rIsInteger(e) && rcmp(e, rat(0)) >= 0) return omitOne && s === '1' ? base : `${base}^${s}`;
  return `${base}^(${s})`;
}
