/**
 * Putting two series on one q-grid: a common start and a common step 1/Q such that
 * both grids are sub-grids of it (needed before adding, never for multiplying).
 */
import { JSBI, ONE, lcmNumber, toNumber } from './integer.js';
import { type Rational, rsub, rmin, rmul, rat, rcmp } from './rational.js';
import { type QZSeries, sliceCountTo } from './qz-series.js';
import { type Slice, EMPTY_SLICE } from './slice.js';

export interface Grid {
  readonly start: Rational;
  readonly qDen: number;
}

/** The coarsest grid containing the grids of all given series. */
export function commonGrid(series: readonly QZSeries[]): Grid {
  let start = series[0]!.start;
  let qDen = 1;
  for (const s of series) {
    start = rmin(start, s.start);
    qDen = lcmNumber(qDen, s.qDen);
  }
  for (const s of series) {
    const d = rsub(s.start, start);
    qDen = lcmNumber(qDen, toNumber(d.den));
  }
  return { start, qDen };
}

/** s re-expressed on a finer grid (which must contain s's grid). */
export function regrid(s: QZSeries, g: Grid): QZSeries {
  if (rcmp(g.start, s.start) === 0 && g.qDen === s.qDen) return s;
  const ratio = g.qDen / s.qDen;
  const off = rmul(rsub(s.start, g.start), rat(g.qDen));
  if (!Number.isInteger(ratio) || !JSBI.equal(off.den, ONE) || rcmp(off, rat(0)) < 0) {
    throw new RangeError('internal: grid does not contain the series grid');
  }
  const o = toNumber(off.num);
  const n = sliceCountTo(g.start, g.qDen, s.exactTo);
  const slices = new Array<Slice>(n).fill(EMPTY_SLICE);
  for (let i = 0; i < s.slices.length; i++) {
    const k = o + i * ratio;
    if (k < n) slices[k] = s.slices[i]!;
  }
  return { ...s, start: g.start, qDen: g.qDen, slices };
}
