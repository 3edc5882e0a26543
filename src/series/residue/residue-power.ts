/**
 * Powers of residue series. A q-only series whose lowest row is a unit mod p takes
 * J.C.P. Miller's recurrence (Knuth, TAOCP vol. 2, §4.7; Henrici 1974) for any
 * integer k, negative included — for g = f^k with f = Σ a_j t^j, a_0 invertible:
 *   b_0 = a_0^k,  b_n = (n·a_0)⁻¹ Σ_{j=1..n} ((k+1)·j − n)·a_j·b_{n−j},
 * which needs n invertible mod p: the row count stays far below every prime. A sparse
 * base (η by Euler's pentagonal theorem) makes it O(terms·N). The other routes — a
 * power taken pointwise after one transform, k − 1 sparse products, squaring, Newton's
 * inverse for negative k, Miller at the ζ-evaluation points of a two-variable base
 * (residue-power-evaluated.ts) — are chosen by operation count (choosePowerRoute), each
 * truncated to the rows asked for.
 */
import { type Rational, rat, rmul, radd, rsub, rmin, rcmp } from '../rational.js';
import { sliceCountTo } from '../qz-series.js';
import { mulmod, powmod, invmod, inverseTable, reduceDouble } from '../modular/mulmod.js';
import { nttForward, nttInverse, transformLength, pointwisePower } from '../modular/ntt.js';
import { NTT_MAX_LOG } from '../modular/ntt-primes.js';
import { type ResidueSeries, truncateResidues, trimColumns } from './residue-series.js';
import { multiplyResidues, NTT_BUTTERFLY_COST } from './residue-multiply.js';
import { inverseNewtonResidues } from './residue-inverse.js';
import { sharedTerms, millerFourPrimes } from './miller-four-primes.js';
import { evaluatedPlan, evaluatedApplies, powerEvaluatedResidues } from './residue-power-evaluated.js';
import type { Spectrum } from './residue-spectrum.js';
import { bySquaring } from './by-squaring.js';

function millerOnePrime(a: Int32Array, k: number, rows: number, p: number): Int32Array {
  const pinv = 1 / p;
  const half = p >> 1;
  const idx: number[] = [];
  const sym: number[] = [];
  const aRows = Math.min(rows, a.length);
  let maxA = 0;
  for (let j = 1; j < aRows; j++) {
    const x = a[j]!;
    if (x === 0) continue;
    idx.push(j);
    const s = x > half ? x - p : x;
    sym.push(s);
    maxA = Math.max(maxA, Math.abs(s));
  }
  const a0 = a[0]!;
  const b = new Int32Array(rows);
  if (rows === 0) return b;
  const kk = k >= 0 ? k % (p - 1) : (k % (p - 1)) + (p - 1);
  b[0] = powmod(a0, kk, p);
  const invA0 = invmod(a0, p);
  const inv = inverseTable(rows, p);
  const sMax = maxA * (Math.abs(k + 1) * rows + rows);
  // |term| ≤ sMax·p; a chunk of perReduction terms plus a reduced remainder stays below 2^53
  const perReduction = Math.floor(2 ** 52 / (Math.max(1, sMax) * p));
  const m = idx.length;
  const at = Int32Array.from(idx);
  const sy = Float64Array.from(sym);
  const cj = Float64Array.from(idx, (j, t) => (k + 1) * j * sym[t]!);
  let live = 0;
  for (let n = 1; n < rows; n++) {
    let acc = 0;
    while (live < m && at[live]! <= n) live++;
    if (perReduction >= 1) {
      for (let t0 = 0; t0 < live; t0 += perReduction) {
        const end = Math.min(live, t0 + perReduction);
        // two accumulators: the chunk's bound (|term|·perReduction < 2^52) holds for their sum
        let a1 = 0;
        let a2 = 0;
        let t = t0;
        for (; t + 1 < end; t += 2) {
          a1 += (cj[t]! - n * sy[t]!) * b[n - at[t]!]!;
          a2 += (cj[t + 1]! - n * sy[t + 1]!) * b[n - at[t + 1]!]!;
        }
        if (t < end) a1 += (cj[t]! - n * sy[t]!) * b[n - at[t]!]!;
        acc = reduceDouble(acc + a1 + a2, p, pinv);
      }
      if (acc < 0) acc += p;
    } else {
      for (let t = 0; t < m; t++) {
        const j = idx[t]!;
        if (j > n) break;
        let w = ((k + 1) * j - n) % p;
        if (w < 0) w += p;
        acc += mulmod(mulmod(w, a[j]!, p, pinv), b[n - j]!, p, pinv);
        if (acc >= p) acc -= p;
      }
    }
    b[n] = mulmod(mulmod(acc, inv[n]!, p, pinv), invA0, p, pinv);
  }
  return b;
}

/** Miller's recurrence applies: one column, and the lowest row a unit mod every prime. */
export function millerApplies(f: ResidueSeries): boolean {
  return f.width === 1 && f.rows > 0 && f.data.every((a) => a[0] !== 0);
}

/** f^k to q-order X, through Miller's recurrence (see millerApplies). */
export function powerMillerResidues(f: ResidueSeries, k: number, X: Rational): ResidueSeries {
  const start = rmul(f.start, rat(k));
  const exactTo = rmin(X, radd(f.exactTo, rmul(f.start, rat(k - 1))));
  const rows = sliceCountTo(start, f.qDen, exactTo);
  if (rows >= f.primes[f.primes.length - 1]!.p) throw new RangeError('internal: too many rows for the primes');
  const data: Int32Array[] = new Array<Int32Array>(f.primes.length);
  let i = 0;
  for (; i + 4 <= f.primes.length; i += 4) {
    const primes = f.primes.slice(i, i + 4);
    const arrays = f.data.slice(i, i + 4);
    const terms = sharedTerms(arrays, primes, rows);
    const four = terms === null ? null : millerFourPrimes(terms, arrays.map((a) => a[0]!), k, rows, primes);
    if (four === null) break;
    four.forEach((a, q) => (data[i + q] = a));
  }
  for (; i < f.primes.length; i++) data[i] = millerOnePrime(f.data[i]!, k, rows, f.primes[i]!.p);
  return { ...f, start, rows, exactTo, data, zLo: f.zLo * k, zStep: 1, width: 1 };
}

/** f^k, k ≥ 1, to q-order X by repeated squaring. */
export function powerSquaringResidues(f: ResidueSeries, k: number, X: Rational): ResidueSeries {
  // f^j is needed to X − (k − j)·v(f) (by-squaring.ts)
  const need = (j: number): Rational => rsub(X, rmul(f.start, rat(k - j)));
  return truncateIfPast(bySquaring(f, k, (a, b, j) => multiplyResidues(a, b, need(j))), X);
}

function truncateIfPast(r: ResidueSeries, X: Rational): ResidueSeries {
  return rcmp(r.exactTo, X) > 0 ? truncateResidues(r, X) : r;
}

/**
 * f^k, k ≥ 2, in the transform domain: the rows f needs, packed with stride
 * W = k(w − 1) + 1 so that no power of a row spills into the next (Kronecker), one
 * forward transform long enough for the whole untruncated power, k-th powers pointwise,
 * one inverse transform.
 */
export function powerTransformResidues(f: ResidueSeries, k: number, X: Rational): ResidueSeries {
  const start = rmul(f.start, rat(k));
  const exactTo = rmin(X, radd(f.exactTo, rmul(f.start, rat(k - 1))));
  const rows = sliceCountTo(start, f.qDen, exactTo);
  const used = Math.min(rows, f.rows);
  const W = k * (f.width - 1) + 1;
  const n = transformLength(k * ((used - 1) * W + f.width - 1) + 1);
  const data = f.primes.map((prime, pi) => {
    const { p } = prime;
    const a = f.data[pi]!;
    const t = new Int32Array(n);
    for (let i = 0; i < used; i++) for (let j = 0; j < f.width; j++) t[i * W + j] = a[i * f.width + j]!;
    nttForward(t, prime);
    pointwisePower(t, k, invmod(n % p, p), prime);
    nttInverse(t, prime, true);
    return t.slice(0, rows * W);
  });
  return trimColumns({ ...f, start, rows, exactTo, zLo: f.zLo * k, width: W, data });
}

/**
 * One term of Miller's recurrence at an evaluation point (a reduction and a multiply-add)
 * against one multiply-add of the sparse path: about 3.2 ns on the bench machine (41
 * rows, k = 6, 1536 points, in isolation) against the 2.1–2.3 ns of NTT_BUTTERFLY_COST's
 * measurement.
 */
const MILLER_POINT_TERM_COST = 1.5;

/**
 * f^k (f q-only, k ≥ 2) left in the transform domain, for a sum to combine before one
 * inverse (residue-spectrum.ts) — where the transform is f^k's own route anyway (the
 * transform route, or a single squaring: the same two transforms); else null.
 * `force` skips the route's check (tests).
 */
export function powerSpectrum(f: ResidueSeries, k: number, X: Rational, force = false): Spectrum | null {
  if (f.width !== 1 || k < 2) return null;
  const route = force ? 'transform' : choosePowerRoute(f, k, X);
  if (route !== 'transform' && !(route === 'squaring' && k === 2)) return null;
  const start = rmul(f.start, rat(k));
  const exactTo = rmin(X, radd(f.exactTo, rmul(f.start, rat(k - 1))));
  const rows = sliceCountTo(start, f.qDen, exactTo);
  const used = Math.min(rows, f.rows);
  const n = transformLength(k * (used - 1) + 1);
  if (n > 2 ** NTT_MAX_LOG) return null;
  const data = f.primes.map((prime, pi) => {
    const t = new Int32Array(n);
    t.set(f.data[pi]!.subarray(0, used));
    nttForward(t, prime);
    pointwisePower(t, k, 1, prime);
    return t;
  });
  return { primes: f.primes, start, qDen: f.qDen, rows, exactTo, n, data };
}

function butterflies(n: number): number {
  return NTT_BUTTERFLY_COST * 0.5 * n * Math.log2(n);
}

type PowerRoute = 'miller' | 'transform' | 'squaring' | 'newton' | 'repeated' | 'evaluated';

function nonZeroEntries(f: ResidueSeries, rows: number): number {
  const a = f.data[0]!;
  const end = Math.min(a.length, rows * f.width);
  let n = 0;
  for (let i = 0; i < end; i++) if (a[i] !== 0) n++;
  return n;
}

/** f^k, k ≥ 2, as f·f·…·f: k − 1 products by f, each kept to X − (k − j)·v(f). */
export function powerRepeatedResidues(f: ResidueSeries, k: number, X: Rational): ResidueSeries {
  let result = f;
  for (let j = 2; j <= k; j++) result = multiplyResidues(result, f, rsub(X, rmul(f.start, rat(k - j))));
  return truncateIfPast(result, X);
}

/** Multiply-adds of Miller's recurrence on a one-column base: its terms times the rows. */
function millerWork(f: ResidueSeries, rows: number): number {
  return nonZeroEntries(f, rows) * rows;
}

/**
 * f^k, k < 0: Miller's recurrence, or 1/f by Newton (about four products of twice the
 * length in all, three transforms each) raised to |k| by squaring.
 */
function negativeRoute(f: ResidueSeries, k: number, X: Rational): PowerRoute {
  const rows = sliceCountTo(rmul(f.start, rat(k)), f.qDen, rmin(X, radd(f.exactTo, rmul(f.start, rat(k - 1)))));
  if (transformLength(2 * rows) > 2 ** NTT_MAX_LOG) return 'miller';
  const newton = 12 * butterflies(transformLength(2 * rows)) + (k === -1 ? 0 : squaringCost(1, rows, -k));
  return millerWork(f, rows) <= newton ? 'miller' : 'newton';
}

/**
 * The cheapest route by operation counts: Miller (non-zero terms)·rows multiply-adds;
 * the transform route two transforms of the whole power plus n·log₂k multiplications;
 * evaluation in ζ a transform per row each way and Miller's rows²/2 terms per point;
 * squaring about ⌈log₂k⌉ + popcount(k) − 1 products of twice the truncated length,
 * three transforms each.
 */
function choosePowerRoute(f: ResidueSeries, k: number, X: Rational): PowerRoute {
  if (k < 0) return negativeRoute(f, k, X);
  const rows = sliceCountTo(rmul(f.start, rat(k)), f.qDen, rmin(X, radd(f.exactTo, rmul(f.start, rat(k - 1)))));
  const used = Math.min(rows, f.rows);
  const costs: [PowerRoute, number][] = [];
  if (millerApplies(f)) costs.push(['miller', millerWork(f, rows)]);
  const W = k * (f.width - 1) + 1;
  const whole = k * ((used - 1) * W + f.width - 1) + 1;
  if (whole <= 2 ** NTT_MAX_LOG) {
    const n = transformLength(whole);
    costs.push(['transform', 2 * butterflies(n) + n * Math.log2(k + 1)]);
  }
  costs.push(['squaring', squaringCost(f.width, rows, k)]);
  const plan = evaluatedPlan(f, k, X);
  if (f.width > 1 && evaluatedApplies(f, k, plan)) {
    const L = plan.points;
    costs.push(['evaluated', (plan.used + plan.rows) * butterflies(L) + L * MILLER_POINT_TERM_COST * (plan.rows * plan.rows) / 2]);
  }
  // a sparse base (theta) is cheapest multiplied in k − 1 times, by the sparse path
  const nnz = nonZeroEntries(f, used);
  let repeated = 0;
  for (let j = 2; j <= k; j++) repeated += (nnz * rows * (j * (f.width - 1) + 1)) / 2;
  costs.push(['repeated', repeated]);
  costs.sort((x, y) => x[1] - y[1]);
  return costs[0]![0];
}

/** Transforms of the squaring chain: a square costs two, a product three, each of twice the truncated rows at its width. */
function squaringCost(width: number, rows: number, k: number): number {
  const widthOf = (pow: number): number => pow * (width - 1) + 1;
  let cost = 0;
  let have = 0;
  let pow = 1;
  for (let e = k; e > 0; e >>= 1) {
    if (e & 1) {
      if (have > 0) cost += 3 * butterflies(transformLength(2 * rows * widthOf(have + pow)));
      have += pow;
    }
    if (e > 1) {
      pow *= 2;
      cost += 2 * butterflies(transformLength(2 * rows * widthOf(pow)));
    }
  }
  return cost;
}

export function powerResidues(f: ResidueSeries, k: number, X: Rational): ResidueSeries {
  if (k === 1) return truncateIfPast(f, X);
  if (k === 0) throw new RangeError('internal: f^0 is the constant 1, not a residue power');
  switch (choosePowerRoute(f, k, X)) {
    case 'miller':
      if (!millerApplies(f)) throw new RangeError('internal: a negative power of a series without a unit lead');
      return powerMillerResidues(f, k, X);
    case 'transform':
      return powerTransformResidues(f, k, X);
    case 'repeated':
      return powerRepeatedResidues(f, k, X);
    case 'evaluated':
      return powerEvaluatedResidues(f, k, X);
    case 'newton': {
      // 1/f is needed to X − (|k| − 1)·v(1/f), v(1/f) = −v(f)
      const g = inverseNewtonResidues(f, radd(X, rmul(f.start, rat(-k - 1))));
      return k === -1 ? truncateIfPast(g, X) : powerResidues(g, -k, X);
    }
    default:
      return powerSquaringResidues(f, k, X);
  }
}
