/**
 * Coefficient-by-coefficient comparison of the two sides of F = 0 up to a q-order:
 * the first mismatch in the order of CLAIMS.md (lowest q, then |ℓ|, then ℓ), with
 * both sides' exact values, and the number of coefficients compared (positions where
 * either side is non-zero; every other coefficient is zero on both).
 */
import {
  type QZSeries,
  type Rational,
  rat,
  rcmp,
  isZero,
  linearCombination,
  truncateSeries,
  sliceExponent,
  coefficientAt,
  rationalToString,
} from '../series/index.js';

export interface Mismatch {
  readonly q: Rational;
  /** ζ-exponent in units of ½. */
  readonly zetaHalves: number;
  readonly left: Rational;
  readonly right: Rational;
}

export interface Comparison {
  readonly mismatch: Mismatch | null;
  readonly compared: number;
}

function nonZeroPositions(s: QZSeries, into: Set<string>): void {
  s.slices.forEach((sl, i) => {
    const x = rationalToString(sliceExponent(s, i));
    sl.c.forEach((v, k) => {
      if (!isZero(v)) into.add(`${x}|${sl.lo + k}`);
    });
  });
}

export function compareTo(left: QZSeries, right: QZSeries, X: Rational): Comparison {
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
    const sl = d.slices[i]!;
    let best: number | null = null;
    sl.c.forEach((v, k) => {
      if (isZero(v)) return;
      const e = sl.lo + k;
      if (best === null || Math.abs(e) < Math.abs(best) || (Math.abs(e) === Math.abs(best) && e < best)) best = e;
    });
    if (best !== null) {
      const q = sliceExponent(d, i);
      return {
        mismatch: { q, zetaHalves: best, left: coefficientAt(a, q, best), right: coefficientAt(b, q, best) },
        compared: positions.size,
      };
    }
  }
  return { mismatch: null, compared: positions.size };
}
