/**
 * Powers of residue series. A q-only series whose lowest row is a unit mod p takes
 * J.C.P. Miller's recurrence (Knuth, TAOCP vol. 2, §4.7; Henrici 1974) for any
 * integer k, negative included — for g = f^k with f = Σ a_j t^j, a_0 invertible:
 *   b_0 = a_0^k,  b_n = (n·a_0)⁻¹ Σ_{j=1..n} ((k+1)·j − n)·a_j·b_{n−j},
 * which needs n invertible mod p: the row count stays far below every prime. A sparse
 * base (η by Euler's pentagonal theorem) makes it O(terms·N). Everything else is
 * repeated squaring, truncated to the rows asked for.
 */
import { type Rational, rat, rmul, radd, rsub, rmin } from '../rational.js';
import { sliceCountTo } from '../qz-series.js';
import { mulmod, powmod, invmod } from '../modular/mulmod.js';
import { type ResidueSeries, truncateResidues } from './residue-series.js';
import { multiplyResidues, NTT_BUTTERFLY_COST } from './residue-multiply.js';

/** 1/1, …, 1/n mod p by inv(i) = −⌊p/i⌋·inv(p mod i). */
function inverseTable(n: number, p: number): Int32Array {
  const inv = new Int32Array(n + 1);
  const pinv = 1 / p;
  if (n >= 1) inv[1] = 1;
  for (let i = 2; i <= n; i++) inv[i] = p - mulmod(Math.floor(p / i), inv[p % i]!, p, pinv);
  return inv;
}

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
  const perReduction = Math.floor(2 ** 53 / (Math.max(1, sMax) * p));
  const m = idx.length;
  for (let n = 1; n < rows; n++) {
    let acc = 0;
    if (perReduction >= 1) {
      let since = 0;
      for (let t = 0; t < m; t++) {
        const j = idx[t]!;
        if (j > n) break;
        acc += ((k + 1) * j - n) * sym[t]! * b[n - j]!;
        if (++since === perReduction) {
          acc %= p;
          since = 0;
        }
      }
      acc %= p;
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
  const data = f.primes.map((pr, i) => millerOnePrime(f.data[i]!, k, rows, pr.p));
  return { ...f, start, rows, exactTo, data, zLo: f.zLo * k, zStep: 1, width: 1 };
}

/** f^k, k ≥ 1, to q-order X by repeated squaring. */
export function powerSquaringResidues(f: ResidueSeries, k: number, X: Rational): ResidueSeries {
  if (k < 1) throw new RangeError('internal: repeated squaring needs k ≥ 1');
  let result: ResidueSeries | null = null;
  let base = f;
  let pow = 1;
  let e = k;
  while (e > 0) {
    if (e & 1) result = result === null ? base : multiplyResidues(result, base, X);
    e >>= 1;
    if (e === 0) break;
    pow *= 2;
    // f^pow is needed only to X − (k − pow)·v(f)
    base = multiplyResidues(base, base, rsub(X, rmul(f.start, rat(k - pow))));
  }
  return truncateIfPast(result!, X);
}

function truncateIfPast(r: ResidueSeries, X: Rational): ResidueSeries {
  return sliceCountTo(r.start, r.qDen, X) < r.rows ? truncateResidues(r, X) : r;
}

/**
 * Miller costs (non-zero terms)·rows multiply-adds; squaring about log₂k NTT products
 * of twice the length, each ≈ 3·n·log₂n butterflies (NTT_BUTTERFLY_COST each).
 */
function millerCheaper(f: ResidueSeries, k: number): boolean {
  const a = f.data[0]!;
  let terms = 0;
  for (let i = 0; i < a.length; i++) if (a[i] !== 0) terms++;
  let n = 1;
  while (n < 2 * f.rows) n <<= 1;
  const squaring = Math.ceil(Math.log2(k + 1)) * NTT_BUTTERFLY_COST * 3 * n * Math.log2(n);
  return terms * f.rows <= squaring;
}

export function powerResidues(f: ResidueSeries, k: number, X: Rational): ResidueSeries {
  if (k === 1) return truncateIfPast(f, X);
  if (millerApplies(f) && (k < 0 || millerCheaper(f, k))) return powerMillerResidues(f, k, X);
  return powerSquaringResidues(f, k, X);
}
