/**
 * Coefficient-by-coefficient comparison of the two sides of F = 0 up to a q-order:
 * the first mismatch in the order of CLAIMS.md (lowest q, then the ζ-exponent by a
 * norm — |ℓ| for one variable, ℓᵀM⁻¹ℓ for several — then lexicographically), with both
 * sides' exact values, and the number of coefficients compared (positions where either
 * side is non-zero; every other coefficient is zero on both).
 */
import {
  type QZSeries,
  type Rational,
  rat,
  rcmp,
  linearCombination,
  truncateSeries,
  sliceExponent,
  coefficientAt,
  rationalToString,
  forEachTerm,
  vectorKey,
  lexCompare,
} from '../series/index.js';

export interface Mismatch {
  readonly q: Rational;
  /** ζ-exponent vector in units of ½. */
  readonly zetaHalves: readonly number[];
  readonly left: Rational;
  readonly right: Rational;
}

export interface Comparison {
  readonly mismatch: Mismatch | null;
  readonly compared: number;
}

/**
 * The norm that orders ζ-exponents within a q-slice, as an exact integer key (a fixed
 * positive multiple of the norm); exponents given in halves.
 */
export type ZetaNorm = (halves: readonly number[]) => number;

/** One variable: |ℓ|; several variables without an index: ℓᵀℓ. */
export const defaultZetaNorm: ZetaNorm = (e) => (e.length === 1 ? Math.abs(e[0]!) : e.reduce((s, x) => s + x * x, 0));


function nonZeroPositions(s: QZSeries, into: Set<string>): void {
  s.slices.forEach((sl, i) => {
    const x = rationalToString(sliceExponent(s, i));
    forEachTerm(sl, (e) => into.add(`${x}|${vectorKey(e)}`));
  });
}

export function compareTo(left: QZSeries, right: QZSeries, X: Rational, norm: ZetaNorm = defaultZetaNorm): Comparison {
  if (rcmp(left.exactTo, X) < 0 || rcmp(right.exactTo, X) < 0) {
    throw new RangeError('internal: a side is not known to the q-order compared');
  }
  const a = truncateSeries(left, X);
  const b = truncateSeries(right, X);
  const d = linearCombination([
    { series: a, coefficient: rat(1) },
    { series: b, coefficient: rat(-1) },
  ]);
  const positions = new Set<string>();
  nonZeroPositions(a, positions);
  nonZeroPositions(b, positions);
  for (let i = 0; i < d.slices.length; i++) {
    let best: readonly number[] | null = null;
    let bestNorm = 0;
    forEachTerm(d.slices[i]!, (e) => {
      const n = norm(e);
      const c = best === null ? -1 : n - bestNorm || lexCompare(e, best);
      if (c < 0) {
        best = e;
        bestNorm = n;
      }
    });
    if (best !== null) {
      const q = sliceExponent(d, i);
      const e: readonly number[] = best;
      return {
        mismatch: { q, zetaHalves: e, left: coefficientAt(a, q, e), right: coefficientAt(b, q, e) },
        compared: positions.size,
      };
    }
  }
  return { mismatch: null, compared: positions.size };
}
