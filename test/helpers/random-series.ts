/** Seeded random series for engine tests (every algorithm against schoolbook). */
import fc from 'fast-check';
import {
  type QZSeries,
  type Slice,
  EMPTY_SLICE,
  JSBI,
  int,
  rat,
  makeSeries,
  trimSlice,
  forEachTerm,
  rational,
  rationalToString,
  sliceExponent,
} from '../../src/series/index.js';

export interface RandomSeriesShape {
  readonly slices: number;
  readonly width: number;
  /** Probability that a coefficient is non-zero. */
  readonly density: number;
  readonly bits: number;
}

export const seriesArbitrary = (shape: RandomSeriesShape): fc.Arbitrary<QZSeries> =>
  fc
    .record({
      startNum: fc.integer({ min: -8, max: 8 }),
      startDen: fc.constantFrom(1, 2, 8, 24),
      den: fc.constantFrom(1, 1, 2, 3, 12),
      rows: fc.array(
        fc.record({
          lo: fc.integer({ min: -shape.width, max: shape.width }),
          c: fc.array(
            fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.bigInt({ min: -(1n << BigInt(shape.bits)), max: 1n << BigInt(shape.bits) })),
            { minLength: 0, maxLength: shape.width },
          ),
        }),
        { minLength: shape.slices, maxLength: shape.slices },
      ),
    })
    .map(({ startNum, startDen, den, rows }) => {
      const slices: Slice[] = rows.map((r) =>
        r.c.length === 0
          ? EMPTY_SLICE
          : trimSlice(
              r.lo,
              r.c.map(([p, v]) => (p < shape.density ? JSBI.BigInt(v.toString()) : int(0))),
            ),
      );
      const start = rat(startNum, startDen);
      const exactTo = rat(startNum * 1 + (shape.slices - 1) * startDen, startDen);
      return makeSeries(start, 1, int(den), slices, exactTo);
    });

/**
 * Canonical text of a series: its q-order and every non-zero coefficient as
 * `q-exponent ζ-halves value`, independent of grid, start and denominator layout.
 */
export function seriesKey(s: QZSeries): string {
  const terms: string[] = [];
  s.slices.forEach((sl, i) => {
    const x = rationalToString(sliceExponent(s, i));
    forEachTerm(sl, (e, v) => terms.push(`${x} ${e.join(',')} ${rationalToString(rational(v, s.den))}`));
  });
  return `to ${rationalToString(s.exactTo)}: ${terms.join('; ')}`;
}
