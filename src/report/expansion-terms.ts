/**
 * The non-zero coefficients of a one-variable expansion in the order CLAIMS.md fixes
 * for output: by q-exponent, then by |ℓ|, then by ℓ.
 */
import {
  type QZSeries,
  type Rational,
  isZero,
  rational,
  sliceExponent,
} from '../series/index.js';

export interface ExpansionTerm {
  readonly q: Rational;
  /** ζ-exponent in units of ½. */
  readonly zetaHalves: number;
  readonly c: Rational;
}

export function sliceTerms(s: QZSeries, i: number): ExpansionTerm[] {
  const sl = s.slices[i]!;
  const q = sliceExponent(s, i);
  const out: ExpansionTerm[] = [];
  sl.c.forEach((v, k) => {
    if (!isZero(v)) out.push({ q, zetaHalves: sl.lo + k, c: rational(v, s.den) });
  });
  return out.sort((a, b) => Math.abs(a.zetaHalves) - Math.abs(b.zetaHalves) || a.zetaHalves - b.zetaHalves);
}

export function expansionTerms(s: QZSeries): ExpansionTerm[] {
  const out: ExpansionTerm[] = [];
  for (let i = 0; i < s.slices.length; i++) out.push(...sliceTerms(s, i));
  return out;
}
