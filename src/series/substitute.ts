/**
 * Substitutions of the abelian variables. With w = A·z (A an m×n integer matrix), a
 * series in w becomes a series in z, ζ_w^ℓ ↦ ζ_z^{Aᵀℓ} (slice.ts); one variable:
 * z ↦ a·z is ζ ↦ ζ^a, and a = 0 restricts to z = 0. Exact to the same q-order. Index
 * and type bookkeeping belong to the type layer, not here.
 */
import { type QZSeries, makeSeries } from './qz-series.js';
import { sliceSubstitute, sliceSubstituteLinear } from './slice.js';

export function substituteZeta(s: QZSeries, a: number): QZSeries {
  if (!Number.isSafeInteger(a)) throw new RangeError('substitution factor too large');
  return makeSeries(s.start, s.qDen, s.den, s.slices.map((sl) => sliceSubstitute(sl, a)), s.exactTo, s.nvars);
}

/** The pullback along w = A·z: A has s.nvars rows; the result has A's column count of variables. */
export function substituteLinear(s: QZSeries, A: readonly (readonly number[])[]): QZSeries {
  if (A.length !== s.nvars) throw new RangeError('internal: substitution matrix does not fit the series');
  const n = A[0]!.length;
  return makeSeries(s.start, s.qDen, s.den, s.slices.map((sl) => sliceSubstituteLinear(sl, A)), s.exactTo, n);
}
