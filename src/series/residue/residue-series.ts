/**
 * The modular back-end's series (ARCHITECTURE.md, the series engine): one variable,
 * the coefficients modulo each of a few word-size primes on a rectangular grid.
 * Row i is q^(start + i/qDen); column j is ζ^((zLo + zStep·j)/2). Each prime's
 * residues, in [0, p), fill one Int32Array row by row. Like `QZSeries`, a residue
 * series holds exactly the rows with exponent ≤ exactTo and knows nothing beyond.
 * A rational coefficient a/b is stored as a·b⁻¹ mod p; the primes divide no
 * denominator (`Majorant.avoid`).
 */
import { JSBI, type Int, gcdNumber, int, isZero } from '../integer.js';
import { type Rational, rcmp } from '../rational.js';
import { type QZSeries, sliceCountTo } from '../qz-series.js';
import { dense } from '../slice.js';
import { invmod, mulmod } from '../modular/mulmod.js';
import type { NttPrime } from '../modular/ntt-primes.js';

/** The shape of a grid series: its q-rows and its ζ-columns. */
export interface GridShape {
  readonly start: Rational;
  readonly qDen: number;
  readonly rows: number;
  readonly exactTo: Rational;
  /** ζ-exponent of column 0, in halves. */
  readonly zLo: number;
  /** ζ-exponent step between columns, in halves (1 when there is one column). */
  readonly zStep: number;
  readonly width: number;
}

/** The grid of a residue series: its shape and its primes. */
export interface ResidueGrid extends GridShape {
  readonly primes: readonly NttPrime[];
}

export interface ResidueSeries extends ResidueGrid {
  /** One array per prime, rows × width, row-major. */
  readonly data: readonly Int32Array[];
}

export function residueOf(x: Int, p: number): number {
  const n = JSBI.toNumber(x);
  let r = Number.isSafeInteger(n) ? n % p : JSBI.toNumber(JSBI.remainder(x, int(p)));
  if (r < 0) r += p;
  return r;
}

export function rationalResidue(r: Rational, p: number): number {
  const d = residueOf(r.den, p);
  if (d === 0) throw new RangeError(`internal: the prime ${p} divides a denominator`);
  return mulmod(residueOf(r.num, p), invmod(d, p), p, 1 / p);
}

export function zeroResidues(primes: readonly NttPrime[], start: Rational, qDen: number, exactTo: Rational): ResidueSeries {
  const rows = sliceCountTo(start, qDen, exactTo);
  return { primes, start, qDen, rows, exactTo, zLo: 0, zStep: 1, width: 1, data: primes.map(() => new Int32Array(rows)) };
}

/** Where an exact one-variable series' coefficients go on its narrowest grid. */
export interface SeriesLayout {
  readonly shape: GridShape;
  /** Calls put(index, c) for every non-zero coefficient c, index = row·width + column. */
  forEachCell(put: (index: number, c: Int) => void): void;
}

export function layoutOfSeries(s: QZSeries): SeriesLayout {
  if (s.nvars !== 1) throw new RangeError('internal: the modular back-end takes one variable');
  const slices = s.slices.map(dense);
  let zLo = Infinity;
  let zHi = -Infinity;
  for (const sl of slices) {
    if (sl.c.length === 0) continue;
    zLo = Math.min(zLo, sl.lo);
    zHi = Math.max(zHi, sl.lo + sl.c.length - 1);
  }
  const rows = slices.length;
  const base = { start: s.start, qDen: s.qDen, rows, exactTo: s.exactTo };
  if (zLo === Infinity) return { shape: { ...base, zLo: 0, zStep: 1, width: 1 }, forEachCell: () => {} };
  let zStep = 0;
  for (const sl of slices) sl.c.forEach((c, i) => {
    if (!isZero(c)) zStep = gcdNumber(zStep, sl.lo + i - zLo);
  });
  if (zStep === 0) zStep = 1;
  const width = (zHi - zLo) / zStep + 1;
  return {
    shape: { ...base, zLo, zStep, width },
    forEachCell(put) {
      slices.forEach((sl, i) => {
        sl.c.forEach((c, j) => {
          const off = sl.lo + j - zLo;
          if (off % zStep === 0 && !isZero(c)) put(i * width + off / zStep, c);
        });
      });
    },
  };
}

/** The residues of an exact one-variable series. */
export function residuesOfSeries(s: QZSeries, primes: readonly NttPrime[]): ResidueSeries {
  const { shape, forEachCell } = layoutOfSeries(s);
  const data = primes.map(({ p }) => {
    const a = new Int32Array(shape.rows * shape.width);
    const dinv = invmod(residueOf(s.den, p), p);
    const pinv = 1 / p;
    forEachCell((t, c) => (a[t] = mulmod(residueOf(c, p), dinv, p, pinv)));
    return a;
  });
  return { ...shape, primes, data };
}

/** The rows with exponent ≤ X (X ≤ exactTo). */
export function truncateResidues(r: ResidueSeries, X: Rational): ResidueSeries {
  if (rcmp(X, r.exactTo) > 0) throw new RangeError('internal: residues asked past their q-order');
  const rows = sliceCountTo(r.start, r.qDen, X);
  if (rows === r.rows) return { ...r, exactTo: X };
  return { ...r, rows, exactTo: X, data: r.data.map((a) => a.subarray(0, rows * r.width)) };
}

/** How a grid maps into a finer one: row i goes to i·rowStep, column j to colOff + j·colStep. */
export interface Regrid {
  readonly rows: number;
  readonly rowStep: number;
  readonly colStep: number;
  readonly colOff: number;
}

/** The map from r's grid to the finer one with q-denominator qDen (a multiple of r's) and ζ-step zStep (dividing r's). */
export function regridOf(r: GridShape, qDen: number, zStep: number, zLo: number): Regrid {
  const rowStep = qDen / r.qDen;
  const colStep = r.width === 1 ? 0 : r.zStep / zStep;
  const colOff = (r.zLo - zLo) / zStep;
  if (!Number.isInteger(rowStep) || !Number.isInteger(colStep) || !Number.isInteger(colOff)) {
    throw new RangeError('internal: regrid to an incompatible grid');
  }
  return { rows: sliceCountTo(r.start, qDen, r.exactTo), rowStep, colStep, colOff };
}

/** Copies a (r's rows × r.width) into out (rows × width) by the map m. */
export function regridInto<T extends Int32Array | Float64Array>(a: T, r: GridShape, m: Regrid, out: T, width: number): T {
  for (let i = 0; i < r.rows; i++) {
    for (let j = 0; j < r.width; j++) out[i * m.rowStep * width + m.colOff + j * m.colStep] = a[i * r.width + j]!;
  }
  return out;
}

/** The same residues on a finer grid: q-denominator a multiple of qDen, ζ-step dividing zStep. */
export function regridResidues(r: ResidueSeries, qDen: number, zStep: number, zLo: number, width: number): ResidueSeries {
  if (qDen === r.qDen && zStep === r.zStep && zLo === r.zLo && width === r.width) return r;
  const m = regridOf(r, qDen, zStep, zLo);
  const data = r.data.map((a) => regridInto(a, r, m, new Int32Array(m.rows * width), width));
  return { ...r, qDen, rows: m.rows, zStep, zLo, width, data };
}

/** The columns [lo, hi] holding every non-zero entry of the arrays (hi < lo if none). */
export function columnSpan(arrays: readonly (Int32Array | Float64Array)[], rows: number, width: number): { lo: number; hi: number } {
  let lo = width;
  let hi = -1;
  for (const a of arrays) {
    for (let i = 0; i < rows; i++) {
      const base = i * width;
      for (let j = 0; j < lo; j++) if (a[base + j] !== 0) { lo = j; break; }
      for (let j = width - 1; j > hi; j--) if (a[base + j] !== 0) { hi = j; break; }
    }
  }
  return { lo, hi };
}

/** Columns [lo, lo + w) of a (rows × width), into out (rows × w). */
export function cutColumns<T extends Int32Array | Float64Array>(a: T, rows: number, width: number, lo: number, w: number, out: T): T {
  for (let i = 0; i < rows; i++) out.set(a.subarray(i * width + lo, i * width + lo + w), i * w);
  return out;
}

/**
 * The same series on the narrowest grid: columns that are zero in every row and modulo
 * every prime are dropped at both ends (a product's rectangle is the sum of its factors'
 * widths, its support much narrower once rows past the q-order are cut).
 */
export function trimColumns(r: ResidueSeries): ResidueSeries {
  const { width, rows } = r;
  const { lo, hi } = columnSpan(r.data, rows, width);
  if (hi < lo) return { ...r, zLo: 0, zStep: 1, width: 1, data: r.data.map(() => new Int32Array(rows)) };
  if (lo === 0 && hi === width - 1) return r;
  const w = hi - lo + 1;
  const data = r.data.map((a) => cutColumns(a, rows, width, lo, w, new Int32Array(rows * w)));
  return { ...r, zLo: r.zLo + lo * r.zStep, width: w, zStep: w === 1 ? 1 : r.zStep, data };
}
