/**
 * Products computed once for all primes. When every entry of a residue series has the
 * same symmetric representative u (|u| < p/2) modulo each prime, u is an integer
 * congruent to the series modulo every prime — whatever the true rational is — and the
 * integer product of two such grids is congruent to the true product modulo every
 * prime. If it stays below 2^52 it is exact in doubles, so one pass gives the residues
 * for all primes (theta products have small integer coefficients all along).
 */
import { reduceDouble } from '../modular/mulmod.js';

export function sharedIntegers(data: readonly Int32Array[], primes: readonly { readonly p: number }[]): Float64Array | null {
  const first = data[0]!;
  const p0 = primes[0]!.p;
  const half0 = p0 >> 1;
  const out = new Float64Array(first.length);
  for (let t = 0; t < first.length; t++) {
    const x = first[t]!;
    if (x === 0) {
      for (let i = 1; i < data.length; i++) if (data[i]![t] !== 0) return null;
      continue;
    }
    const u = x > half0 ? x - p0 : x;
    for (let i = 1; i < data.length; i++) {
      const p = primes[i]!.p;
      if (data[i]![t] !== (u < 0 ? u + p : u)) return null;
    }
    out[t] = u;
  }
  return out;
}

export function maxAbs(u: ArrayLike<number>): number {
  let m = 0;
  for (let t = 0; t < u.length; t++) m = Math.max(m, Math.abs(u[t]!));
  return m;
}

/** Σ|u| rounded up: each of the n additions errs by at most 2^−53 relative, so (1 + n·2^−52) covers them all. */
export function sumAbs(u: ArrayLike<number>): number {
  let s = 0;
  for (let t = 0; t < u.length; t++) s += Math.abs(u[t]!);
  return s * (1 + u.length * 2 ** -52);
}

/** Per row of a rows × width grid, the columns [lo, hi) outside which it is zero. */
export function nonZeroColumns(d: ArrayLike<number>, rows: number, width: number): { readonly lo: Int32Array; readonly hi: Int32Array } {
  const lo = new Int32Array(rows);
  const hi = new Int32Array(rows);
  for (let r = 0; r < rows; r++) {
    let a = 0;
    let b = width;
    while (a < b && d[r * width + a] === 0) a++;
    while (b > a && d[r * width + b - 1] === 0) b--;
    lo[r] = a;
    hi[r] = b;
  }
  return { lo, hi };
}

/**
 * The integer product of s (rows × sw) and d (rows × dw) on rows × W, truncated to
 * `rows`; the caller guarantees max|s|·Σ|d| < 2^52, so every sum is exact.
 */
export function sparseDenseIntegers(s: Float64Array, sw: number, d: Float64Array, dw: number, rows: number, W: number): Float64Array {
  const acc = new Float64Array(rows * W);
  const sRows = Math.min(rows, s.length / sw);
  const dRows = Math.min(rows, d.length / dw);
  const { lo, hi } = nonZeroColumns(d, dRows, dw);
  for (let i = 0; i < sRows; i++) {
    const rowsLeft = Math.min(dRows, rows - i);
    for (let j = 0; j < sw; j++) {
      const c = s[i * sw + j]!;
      if (c === 0) continue;
      for (let r = 0; r < rowsLeft; r++) {
        const off = r * dw - (i + r) * W - j;
        const k1 = (i + r) * W + j + hi[r]!;
        let k = (i + r) * W + j + lo[r]!;
        if (c === 1) for (; k < k1; k++) acc[k] += d[k + off]!;
        else if (c === -1) for (; k < k1; k++) acc[k] -= d[k + off]!;
        else for (; k < k1; k++) acc[k] += c * d[k + off]!;
      }
    }
  }
  return acc;
}

/** The residues of integers below 2^53 modulo p, in [0, p). */
export function integersModulo(acc: Float64Array, p: number): Int32Array {
  const out = new Int32Array(acc.length);
  const pinv = 1 / p;
  for (let t = 0; t < acc.length; t++) {
    const x = acc[t]!;
    if (x !== 0) out[t] = reduceDouble(x, p, pinv);
  }
  return out;
}
