/**
 * The positions two expansions are compared on (CLAIMS.md, "first" mismatch): for
 * every q-exponent up to a q-order, the ζ-exponents at which either side is non-zero,
 * with both sides' exact coefficients. Every other position is zero on both sides, so
 * this is exactly what `compareTo` counts. The digest of certificates and the grids
 * of the HTML report are read from it, so they cannot drift from each other.
 */
import {
  type QZSeries,
  type Rational,
  type Int,
  rcmp,
  rational,
  sliceExponent,
  sliceAtExponent,
  sliceIsZero,
  forEachTerm,
  vectorKey,
  rationalToString,
  ZERO,
  lexCompare,
} from '../series/index.js';
import type { ZetaNorm } from './compare-series.js';

export interface ComparedCell {
  /** ζ-exponents in units of ½. */
  readonly halves: readonly number[];
  readonly left: Rational;
  readonly right: Rational;
}

export interface ComparedRow {
  readonly q: Rational;
  /** In compare order: the ζ-norm, then lexicographically. */
  readonly cells: readonly ComparedCell[];
}


/** The distinct q-exponents ≤ X of the non-zero slices of a and b, ascending. */
function rowExponents(a: QZSeries, b: QZSeries, X: Rational): Rational[] {
  const seen = new Map<string, Rational>();
  for (const s of [a, b]) {
    s.slices.forEach((sl, i) => {
      const q = sliceExponent(s, i);
      if (!sliceIsZero(sl) && rcmp(q, X) <= 0) seen.set(rationalToString(q), q);
    });
  }
  return [...seen.values()].sort(rcmp);
}

/** Both sides' non-zero positions with q-exponent ≤ X, rows ascending, cells in compare order. */
export function comparedRows(a: QZSeries, b: QZSeries, X: Rational, norm: ZetaNorm): ComparedRow[] {
  return rowExponents(a, b, X).map((q) => {
    const acc = new Map<string, { halves: readonly number[]; l: Int; r: Int }>();
    forEachTerm(sliceAtExponent(a, q), (e, v) => acc.set(vectorKey(e), { halves: e, l: v, r: ZERO }));
    forEachTerm(sliceAtExponent(b, q), (e, v) => {
      const k = vectorKey(e);
      const prev = acc.get(k);
      acc.set(k, { halves: e, l: prev === undefined ? ZERO : prev.l, r: v });
    });
    const cells = [...acc.values()]
      .sort((x, y) => norm(x.halves) - norm(y.halves) || lexCompare(x.halves, y.halves))
      .map((c) => ({ halves: c.halves, left: rational(c.l, a.den), right: rational(c.r, b.den) }));
    return { q, cells };
  });
}
