/**
 * f^k for a series in q and ζ, by evaluation in ζ. Write f = ζ^(zLo)·Σ_i P_i(y) t^i with
 * y = ζ^(zStep), t = q^(1/qDen) and P_i of degree < w. Every row of f^k is then ζ^(k·zLo)
 * times a polynomial in y of degree ≤ k(w − 1) < L, L a power of two, so it is known
 * from its values at the L-th roots of unity mod p (every table prime is 1 mod 2^20):
 * a forward transform of each row evaluates f at those points, each point's q-series is
 * raised to the k-th power by Miller's recurrence (residue-power.ts) — after taking out
 * its own valuation t^v, f(y_j) = t^v·h, f^k = t^(kv)·h^k — and an inverse transform of
 * each row interpolates. Miller truncates at the rows asked for, where a transform of
 * the packed series would carry the whole untruncated power: for a wide base and few
 * rows ((φ_{−2,1}φ_{0,1})^6 to q^40) this is several times cheaper.
 */
import { type Rational, rat, rmul, radd, rmin } from '../rational.js';
import { sliceCountTo } from '../qz-series.js';
import { mulmod, powmod, invmod, inverseTable, reduceDouble } from '../modular/mulmod.js';
import { nttForward, nttInverse, transformLength, NTT_MAX_LENGTH } from '../modular/ntt.js';
import { type ResidueSeries, trimColumns } from './residue-series.js';

/** The grid of f^k to X: its start, order, rows, result width and transform length. */
export interface EvaluatedPlan {
  readonly start: Rational;
  readonly exactTo: Rational;
  readonly rows: number;
  readonly used: number;
  readonly width: number;
  readonly points: number;
}

export function evaluatedPlan(f: ResidueSeries, k: number, X: Rational): EvaluatedPlan {
  const start = rmul(f.start, rat(k));
  const exactTo = rmin(X, radd(f.exactTo, rmul(f.start, rat(k - 1))));
  const rows = sliceCountTo(start, f.qDen, exactTo);
  const width = k * (f.width - 1) + 1;
  return { start, exactTo, rows, used: Math.min(rows, f.rows), width, points: transformLength(width) };
}

/**
 * Whether the route applies: k ≥ 2, at most NTT_MAX_LENGTH points, and Miller's sums —
 * rows terms of |(k+1)i − m|·r with |(k+1)i − m| < (k+1)·rows and |r| < 3p — exact in doubles.
 */
export function evaluatedApplies(f: ResidueSeries, k: number, plan: EvaluatedPlan): boolean {
  const pMax = Math.max(...f.primes.map((pr) => pr.p));
  return k >= 2 && plan.points <= NTT_MAX_LENGTH && 3 * (k + 1) * plan.rows * plan.rows * pMax < 2 ** 52;
}

/**
 * Miller's recurrence at one point: a (the point's q-series, `used` rows) to b (rows
 * rows). Each product a_i·b_{m−i} is reduced only to a representative in (−2p, 3p) —
 * ⌊a_i·b/p⌋ from the precomputed a_i/p, the remainder in 32-bit arithmetic — and the
 * weighted sum of them stays exact in doubles (evaluatedApplies).
 */
function powerAtPoint(a: Int32Array, aq: Float64Array, b: Int32Array, used: number, rows: number, k: number, p: number, inv: Int32Array): void {
  const pinv = 1 / p;
  b.fill(0);
  let v = 0;
  while (v < used && a[v] === 0) v++;
  if (v === used || k * v >= rows) return;
  const n = rows - k * v;
  const a0 = a[v]!;
  const scale = invmod(a0, p);
  for (let i = v; i < used; i++) aq[i] = a[i]! * pinv;
  const base = k * v;
  b[base] = powmod(a0, k, p);
  const last = used - 1 - v;
  for (let m = 1; m < n; m++) {
    let s = 0;
    const top = Math.min(m, last);
    for (let i = 1; i <= top; i++) {
      const x = b[base + m - i]!;
      const q = (x * aq[v + i]!) | 0;
      s += ((k + 1) * i - m) * ((Math.imul(a[v + i]!, x) - Math.imul(q, p)) | 0);
    }
    b[base + m] = mulmod(mulmod(reduceDouble(s, p, pinv), inv[m]!, p, pinv), scale, p, pinv);
  }
}

/** f^k, k ≥ 2, to q-order X by evaluation in ζ (see evaluatedApplies). */
export function powerEvaluatedResidues(f: ResidueSeries, k: number, X: Rational): ResidueSeries {
  const plan = evaluatedPlan(f, k, X);
  if (!evaluatedApplies(f, k, plan)) throw new RangeError('internal: the evaluated power does not apply');
  const { rows, used, width, points: L } = plan;
  const data = f.primes.map((prime, pi) => {
    const { p } = prime;
    const a = f.data[pi]!;
    const e = new Int32Array(used * L);
    for (let i = 0; i < used; i++) {
      const row = e.subarray(i * L, (i + 1) * L);
      row.set(a.subarray(i * f.width, (i + 1) * f.width));
      nttForward(row, prime);
    }
    const out = new Int32Array(rows * L);
    const inv = inverseTable(Math.max(1, rows), p);
    const col = new Int32Array(used);
    const aq = new Float64Array(used);
    const b = new Int32Array(rows);
    for (let j = 0; j < L; j++) {
      for (let i = 0; i < used; i++) col[i] = e[i * L + j]!;
      powerAtPoint(col, aq, b, used, rows, k, p, inv);
      for (let i = 0; i < rows; i++) out[i * L + j] = b[i]!;
    }
    const result = new Int32Array(rows * width);
    for (let i = 0; i < rows; i++) {
      const row = out.subarray(i * L, (i + 1) * L);
      nttInverse(row, prime);
      result.set(row.subarray(0, width), i * width);
    }
    return result;
  });
  return trimColumns({ ...f, start: plan.start, rows, exactTo: plan.exactTo, zLo: f.zLo * k, width, zStep: width === 1 ? 1 : f.zStep, data });
}
