/**
 * Products of residue series, per prime (ARCHITECTURE.md, the series engine). Both
 * factors are put on a common grid (q-denominator the lcm, ζ-step the gcd); then one
 * of three algorithms, chosen by an operation count:
 * - sparse × dense: each non-zero entry of the sparser factor adds a shifted multiple of
 *   the other (theta leaves have O(√N) terms). Small multipliers (|c| < 2^21 in the
 *   symmetric residue) are accumulated in doubles, exact below 2^53, and reduced only
 *   when the accumulated load could reach 2^53;
 * - per ζ-column: a q-only dense factor is transformed once and each column of the
 *   other is multiplied by it;
 * - integers: when both factors are the same small integers modulo every prime and
 *   their product stays below 2^52, the sparse path once, in plain doubles, for all
 *   primes (shared-integers.ts);
 * - Kronecker substitution: rows packed with stride W (the product's width), one NTT
 *   product per prime — per pair of row blocks when the packed product would be longer
 *   than the primes' largest transform (2^20).
 */
import { type Rational, radd, rmin } from '../rational.js';
import { gcdNumber, lcmNumber } from '../integer.js';
import { sliceCountTo } from '../qz-series.js';
import { nttMultiply, nttForward, nttInverse, pointwiseMultiply, transformLength, NTT_MAX_LENGTH } from '../modular/ntt.js';
import { mulmod, invmod, reduceDouble } from '../modular/mulmod.js';
import type { NttPrime } from '../modular/ntt-primes.js';
import { type ResidueSeries, type ResidueGrid, type GridShape, regridResidues, trimColumns } from './residue-series.js';
import { sharedIntegers, maxAbs, sumAbs, sparseDenseIntegers, integersModulo, nonZeroColumns } from './shared-integers.js';

/**
 * Cost of one NTT butterfly (with its share of the pointwise products) against one
 * multiply-add of the sparse path. Measured on the bench machine (2 cores, Node 20,
 * `multiplyResiduesBy` on random grids of 200×50, 400×100 and 1000×1 entries against
 * 5%-dense ±1 factors): about 6.5 ns per butterfly and 2.1–2.3 ns per multiply-add.
 */
export const NTT_BUTTERFLY_COST = 3;
/** Largest |c| of a sparse multiplier kept in doubles: |c|·p < 2^51. */
const SMALL_MULTIPLIER = 2 ** 21;

/** Where a product lives: the factors' common q-denominator and ζ-step, their widths on it, the product's grid. */
export interface ProductShape {
  readonly qDen: number;
  readonly zStep: number;
  readonly wa: number;
  readonly wb: number;
  readonly rows: number;
  readonly width: number;
  readonly start: Rational;
  readonly exactTo: Rational;
}

interface Aligned extends ProductShape {
  readonly a: ResidueSeries;
  readonly b: ResidueSeries;
}

function stepOf(r: GridShape): number {
  return r.width === 1 ? 0 : r.zStep;
}

/** The product's grid to q-order X, or less where a factor is not known far enough. */
export function productShape(a: GridShape, b: GridShape, X: Rational): ProductShape {
  const qDen = lcmNumber(a.qDen, b.qDen);
  const zStep = gcdNumber(stepOf(a), stepOf(b)) || 1;
  const wa = (a.width - 1) * (stepOf(a) / zStep) + 1;
  const wb = (b.width - 1) * (stepOf(b) / zStep) + 1;
  const start = radd(a.start, b.start);
  const exactTo = rmin(X, rmin(radd(a.exactTo, b.start), radd(b.exactTo, a.start)));
  return { qDen, zStep, wa, wb, rows: sliceCountTo(start, qDen, exactTo), width: wa + wb - 1, start, exactTo };
}

function align(a: ResidueSeries, b: ResidueSeries, X: Rational): Aligned {
  if (a.primes !== b.primes) throw new RangeError('internal: residue series over different primes');
  const sh = productShape(a, b, X);
  return { ...sh, a: regridResidues(a, sh.qDen, sh.zStep, a.zLo, sh.wa), b: regridResidues(b, sh.qDen, sh.zStep, b.zLo, sh.wb) };
}

/**
 * Loop overhead of the sparse path per (term, row) pair, in multiply-adds: measured as
 * for NTT_BUTTERFLY_COST, from a 61×191 grid times a q-only factor of 61 terms both ways
 * round (a one-column inner loop costs about four multiply-adds per entry).
 */
const SPARSE_ROW_OVERHEAD = 3;

/** Multiply-adds of the sparse path: each non-zero of s in row i meets the other's rows below rows − i. */
export function sparseWork(s: ArrayLike<number>, sw: number, otherRows: number, otherWidth: number, rows: number): number {
  let work = 0;
  const sRows = Math.min(rows, s.length / sw);
  for (let i = 0; i < sRows; i++) {
    let nz = 0;
    for (let j = 0; j < sw; j++) if (s[i * sw + j] !== 0) nz++;
    work += nz * Math.min(otherRows, rows - i) * (otherWidth + SPARSE_ROW_OVERHEAD);
  }
  return work;
}

/** out (rows × W) += sparse(s) ⊗ d, in doubles with deferred reduction. */
function sparseDense(s: Int32Array, sw: number, d: Int32Array, dw: number, rows: number, W: number, p: number): Int32Array {
  const acc = new Float64Array(rows * W);
  const pinv = 1 / p;
  const half = p >> 1;
  const sRows = Math.min(rows, s.length / sw);
  const dRows = Math.min(rows, d.length / dw);
  let load = 0;
  const limit = 2 ** 52 / p;
  // products skip the zeros around each row of d
  const { lo, hi } = nonZeroColumns(d, dRows, dw);
  for (let i = 0; i < sRows; i++) {
    const rowsLeft = Math.min(dRows, rows - i);
    for (let j = 0; j < sw; j++) {
      const c = s[i * sw + j]!;
      if (c === 0) continue;
      const sym = c > half ? c - p : c;
      const small = sym < SMALL_MULTIPLIER && sym > -SMALL_MULTIPLIER;
      const weight = small ? Math.abs(sym) : 1;
      if (load + weight > limit) {
        for (let t = 0; t < acc.length; t++) acc[t] = reduceDouble(acc[t]!, p, pinv);
        load = 1;
      }
      load += weight;
      for (let r = 0; r < rowsLeft; r++) {
        const base = (i + r) * W + j;
        const drow = r * dw;
        const k0 = lo[r]!;
        const k1 = hi[r]!;
        if (small) {
          for (let k = k0; k < k1; k++) acc[base + k] += sym * d[drow + k]!;
        } else {
          for (let k = k0; k < k1; k++) {
            const x = d[drow + k]!;
            if (x !== 0) acc[base + k] += mulmod(c, x, p, pinv);
          }
        }
      }
    }
  }
  const out = new Int32Array(rows * W);
  for (let t = 0; t < out.length; t++) {
    out[t] = reduceDouble(acc[t]!, p, pinv);
  }
  return out;
}

/** Rows of width w laid out with stride W ≥ w (Kronecker substitution). */
function packRows(a: Int32Array, w: number, rows: number, W: number): Int32Array {
  if (w === W) return a.length === rows * W ? a : a.slice(0, rows * W);
  const out = new Int32Array(rows * W);
  for (let i = 0; i < rows; i++) {
    const from = i * w;
    const to = i * W;
    for (let j = 0; j < w; j++) out[to + j] = a[from + j]!;
  }
  return out;
}

function kronecker(a: Int32Array, aw: number, b: Int32Array, bw: number, rows: number, W: number, prime: NttPrime): Int32Array {
  const ra = Math.min(rows, a.length / aw);
  const rb = Math.min(rows, b.length / bw);
  const out = new Int32Array(rows * W);
  // blocks of rows small enough that each packed product fits one transform
  const block = Math.max(1, Math.floor(NTT_MAX_LENGTH / (2 * W)));
  const p = prime.p | 0;
  for (let ia = 0; ia < ra; ia += block) {
    const pa = packRows(a.subarray(ia * aw, Math.min(ra, ia + block) * aw), aw, Math.min(block, ra - ia), W);
    for (let ib = 0; ib < rb && ia + ib < rows; ib += block) {
      const pb = a === b && aw === bw && ia === ib ? pa : packRows(b.subarray(ib * bw, Math.min(rb, ib + block) * bw), bw, Math.min(block, rb - ib), W);
      const prod = nttMultiply(pa, pb, prime);
      const base = (ia + ib) * W;
      const n = Math.min(prod.length, out.length - base);
      for (let t = 0; t < n; t++) {
        let v = out[base + t]! + prod[t]!;
        v -= p;
        v += (v >> 31) & p;
        out[base + t] = v;
      }
    }
  }
  return out;
}

/** Each column of a (rows × aw) times the q-only dense b, b transformed once. */
function perColumn(a: Int32Array, aw: number, b: Int32Array, rows: number, prime: NttPrime): Int32Array {
  const { p } = prime;
  const ra = Math.min(rows, a.length / aw);
  const rb = Math.min(rows, b.length);
  const n = transformLength(ra + rb - 1);
  const fb = new Int32Array(n);
  fb.set(b.subarray(0, rb));
  nttForward(fb, prime);
  const out = new Int32Array(rows * aw);
  const col = new Int32Array(n);
  const ninv = invmod(n % p, p);
  for (let j = 0; j < aw; j++) {
    col.fill(0);
    let any = false;
    for (let i = 0; i < ra; i++) {
      const x = a[i * aw + j]!;
      col[i] = x;
      if (x !== 0) any = true;
    }
    if (!any) continue;
    nttForward(col, prime);
    pointwiseMultiply(col, fb, ninv, p);
    nttInverse(col, prime, true);
    for (let i = 0; i < rows; i++) out[i * aw + j] = col[i]!;
  }
  return out;
}

function log2ceil(n: number): number {
  return Math.max(1, Math.ceil(Math.log2(Math.max(2, n))));
}

export type ResidueProductRoute = 'sparse-a' | 'sparse-b' | 'column-a' | 'column-b' | 'kronecker' | 'integers-a' | 'integers-b';
type Route = ResidueProductRoute;

/**
 * The cheapest transform route for factors of ra and rb rows and widths aw and bw, and
 * its cost for one prime, in multiply-adds of the sparse path; null when no transform fits.
 */
export function transformCost(ra: number, rb: number, aw: number, bw: number, width: number): { route: Route; cost: number } | null {
  const costs: [Route, number][] = [];
  // transforms longer than NTT_MAX_LENGTH have no roots of unity modulo the table's primes
  const nk = 2 ** log2ceil((ra + rb) * width);
  // longer products are cut into blocks of rows (see kronecker), one transform each
  if (2 * width <= NTT_MAX_LENGTH) costs.push(['kronecker', NTT_BUTTERFLY_COST * 1.5 * nk * log2ceil(nk) * Math.max(1, nk / NTT_MAX_LENGTH)]);
  const nc = 2 ** log2ceil(ra + rb);
  if (nc <= NTT_MAX_LENGTH) {
    if (bw === 1) costs.push(['column-a', NTT_BUTTERFLY_COST * (aw * 2 + 1) * 0.5 * nc * log2ceil(nc)]);
    if (aw === 1) costs.push(['column-b', NTT_BUTTERFLY_COST * (bw * 2 + 1) * 0.5 * nc * log2ceil(nc)]);
  }
  costs.sort((x, y) => x[1] - y[1]);
  return costs.length === 0 ? null : { route: costs[0]![0], cost: costs[0]![1] };
}

function chooseRoute(al: Aligned, ints: IntegerOperands | null): Route {
  const { a, b, rows, width } = al;
  const ra = Math.min(rows, a.rows);
  const rb = Math.min(rows, b.rows);
  // the sparse path's work, per prime or once for all (integer route)
  const workA = sparseWork(a.data[0]!, a.width, rb, b.width, rows);
  const workB = sparseWork(b.data[0]!, b.width, ra, a.width, rows);
  const costs: [Route, number][] = [
    ['sparse-a', workA],
    ['sparse-b', workB],
  ];
  const t = transformCost(ra, rb, a.width, b.width, width);
  if (t !== null) costs.push([t.route, t.cost]);
  // the routes above run once per prime, the integer routes once for all
  for (const c of costs) c[1] *= a.primes.length;
  if (ints !== null) {
    costs.push(['integers-a', workA]);
    costs.push(['integers-b', workB]);
  }
  costs.sort((x, y) => x[1] - y[1]);
  return costs[0]![0];
}

/** Both factors as shared integers whose product stays exact in doubles, or null (shared-integers.ts). */
interface IntegerOperands {
  readonly a: Float64Array;
  readonly b: Float64Array;
}

function integerOperands(al: Aligned): IntegerOperands | null {
  const a = sharedIntegers(al.a.data, al.a.primes);
  if (a === null) return null;
  const b = sharedIntegers(al.b.data, al.b.primes);
  if (b === null || maxAbs(a) * sumAbs(b) >= 2 ** 52 || maxAbs(b) * sumAbs(a) >= 2 ** 52) return null;
  return { a, b };
}

/** a·b to q-order X (or less, where a factor is not known far enough). */
export function multiplyResidues(x: ResidueSeries, y: ResidueSeries, X: Rational): ResidueSeries {
  return multiplyResiduesBy(null, x, y, X);
}

/**
 * a·b by a given route (tests compare the routes); null lets the cost model choose.
 * The column routes need the other factor q-only (one column).
 */
export function multiplyResiduesBy(forced: ResidueProductRoute | null, x: ResidueSeries, y: ResidueSeries, X: Rational): ResidueSeries {
  const al = align(x, y, X);
  const { a, b, rows, width } = al;
  const ints = forced === null || forced === 'integers-a' || forced === 'integers-b' ? integerOperands(al) : null;
  const route = forced ?? chooseRoute(al, ints);
  if ((route === 'column-a' && b.width !== 1) || (route === 'column-b' && a.width !== 1)) {
    throw new RangeError('internal: a column product needs a q-only factor');
  }
  if (route === 'integers-a' || route === 'integers-b') {
    if (ints === null) throw new RangeError('internal: the integer route needs shared small integers');
    const acc =
      route === 'integers-a'
        ? sparseDenseIntegers(ints.a, a.width, ints.b, b.width, rows, width)
        : sparseDenseIntegers(ints.b, b.width, ints.a, a.width, rows, width);
    return trimColumns({ ...grid(al), data: a.primes.map((pr) => integersModulo(acc, pr.p)) });
  }
  const data = a.primes.map((prime, i) => {
    const da = a.data[i]!;
    const db = b.data[i]!;
    switch (route) {
      case 'sparse-a':
        return sparseDense(da, a.width, db, b.width, rows, width, prime.p);
      case 'sparse-b':
        return sparseDense(db, b.width, da, a.width, rows, width, prime.p);
      case 'column-a':
        return perColumn(da, a.width, db, rows, prime);
      case 'column-b':
        return perColumn(db, b.width, da, rows, prime);
      default:
        return kronecker(da, a.width, db, b.width, rows, width, prime);
    }
  });
  return trimColumns({ ...grid(al), data });
}

function grid(al: Aligned): ResidueGrid {
  return { primes: al.a.primes, start: al.start, qDen: al.qDen, rows: al.rows, exactTo: al.exactTo, zLo: al.a.zLo + al.b.zLo, zStep: al.zStep, width: al.width };
}
