/**
 * The non-zero coefficients of an expansion in the order CLAIMS.md fixes for output:
 * by q-exponent, then by the ζ-norm (|ℓ| for one variable, ℓᵀM⁻¹ℓ for several), then
 * lexicographically.
 */
import { type QZSeries, type Rational, rational, sliceExponent, forEachTerm, lexCompare } from '../series/index.js';
import { type ZetaNorm, defaultZetaNorm } from '../check/index.js';

export interface ExpansionTerm {
  readonly q: Rational;
  /** ζ-exponent vector in units of ½. */
  readonly zetaHalves: readonly number[];
  readonly c: Rational;
}


/** The terms of slice i in the order of CLAIMS.md: by the norm, then lexicographically. */
export function sliceTerms(s: QZSeries, i: number, norm: ZetaNorm = defaultZetaNorm): ExpansionTerm[] {
  const q = sliceExponent(s, i);
  const out: ExpansionTerm[] = [];
  forEachTerm(s.slices[i]!, (e, v) => out.push({ q, zetaHalves: e, c: rational(v, s.den) }));
  const keyed = out.map((t) => ({ t, n: norm(t.zetaHalves) }));
  keyed.sort((a, b) => a.n - b.n || lexCompare(a.t.zetaHalves, b.t.zetaHalves));
  return keyed.map((k) => k.t);
}

export function expansionTerms(s: QZSeries, norm: ZetaNorm = defaultZetaNorm): ExpansionTerm[] {
  const out: ExpansionTerm[] = [];
  for (let i = 0; i < s.slices.length; i++) out.push(...sliceTerms(s, i, norm));
  return out;
}
