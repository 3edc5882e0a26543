/** Sums and linear combinations of series; the result is exact to the least q-order. */
import { JSBI, type Int, ONE, lcm } from './integer.js';
import { type Rational, rmin, rational } from './rational.js';
import { type QZSeries, makeSeries, truncateSeries } from './qz-series.js';
import { commonGrid, regrid } from './grid.js';
import { type Slice, EMPTY_SLICE, sliceCombine, sliceScale } from './slice.js';

export interface Term {
  readonly series: QZSeries;
  readonly coefficient: Rational;
}

/** Σ coefficient·series, exact to the least q-order among the terms. */
export function linearCombination(terms: readonly Term[]): QZSeries {
  if (terms.length === 0) throw new RangeError('internal: empty linear combination');
  let X = terms[0]!.series.exactTo;
  for (const t of terms) X = rmin(X, t.series.exactTo);
  const cut = terms.map((t) => truncateSeries(t.series, X));
  const g = commonGrid(cut);
  const aligned = cut.map((s) => regrid(s, g));
  let den: Int = ONE;
  for (let i = 0; i < terms.length; i++) {
    den = lcm(den, JSBI.multiply(aligned[i]!.den, terms[i]!.coefficient.den));
  }
  const n = aligned[0]!.slices.length;
  const slices: Slice[] = new Array<Slice>(n).fill(EMPTY_SLICE);
  for (let i = 0; i < terms.length; i++) {
    const s = aligned[i]!;
    const c = terms[i]!.coefficient;
    const factor = JSBI.multiply(c.num, JSBI.divide(den, JSBI.multiply(s.den, c.den)));
    for (let k = 0; k < n; k++) slices[k] = sliceCombine(slices[k]!, null, s.slices[k]!, factor);
  }
  return makeSeries(g.start, g.qDen, den, slices, X, aligned[0]!.nvars);
}

export function addSeries(a: QZSeries, b: QZSeries): QZSeries {
  return linearCombination([
    { series: a, coefficient: rational(1) },
    { series: b, coefficient: rational(1) },
  ]);
}

export function subtractSeries(a: QZSeries, b: QZSeries): QZSeries {
  return linearCombination([
    { series: a, coefficient: rational(1) },
    { series: b, coefficient: rational(-1) },
  ]);
}

/** r·s. */
export function scaleSeries(s: QZSeries, r: Rational): QZSeries {
  return makeSeries(
    s.start,
    s.qDen,
    JSBI.multiply(s.den, r.den),
    s.slices.map((sl) => sliceScale(sl, r.num)),
    s.exactTo,
    s.nvars,
  );
}

export function negateSeries(s: QZSeries): QZSeries {
  return scaleSeries(s, rational(-1));
}
