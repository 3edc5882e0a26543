/**
 * The number-theoretic transform modulo a word-size prime, in place on Int32Array
 * residues, and the cyclic product it gives: a·b mod (p, x^n − 1) with n a power of two
 * at least |a| + |b| − 1 is the full product. The forward transform is decimation in
 * frequency (natural order in, bit-reversed out) and the inverse decimation in time
 * (bit-reversed in, natural out), so a product never permutes (Chu & George, *Inside
 * the FFT black box*, 2000, ch. 4–5). Twiddles are stored stage by stage, contiguous
 * (entry half + k is ω_{2·half}^k), each with its quotient w/p in a double, rounded
 * down, so that ⌊x·w/p⌋ costs one multiplication and is never over (mulShoup, mulmod.ts); the
 * remainder is taken in 32-bit wrapping arithmetic (mulmod.ts) with branch-free
 * corrections (`(v >> 31) & p` adds p exactly when v is negative). Hot loops use only
 * numbers and typed arrays (ARCHITECTURE.md).
 */
import { mulmod, powmod, invmod, mulShoup, shoupQuotient } from './mulmod.js';
import { type NttPrime, NTT_MAX_LOG } from './ntt-primes.js';

interface Twiddles {
  readonly w: Int32Array;
  readonly wq: Float64Array;
}

const twiddleCache = new Map<string, Twiddles>();

/** Stage tables for size n: entry half + k is ω^k, ω a primitive (2·half)-th root (or its inverse). */
function twiddles(prime: NttPrime, n: number, inverse: boolean): Twiddles {
  const key = `${prime.p}:${n}:${inverse ? 1 : 0}`;
  let t = twiddleCache.get(key);
  if (t === undefined) {
    const p = prime.p | 0;
    const pinv = 1 / p;
    const w = new Int32Array(Math.max(2, n));
    const wq = new Float64Array(w.length);
    for (let half = 1; half < n; half <<= 1) {
      let root = powmod(prime.g, (p - 1) / (2 * half), p);
      if (inverse) root = invmod(root, p);
      let x = 1;
      for (let k = 0; k < half; k++) {
        w[half + k] = x;
        wq[half + k] = shoupQuotient(x, p);
        x = mulmod(x, root, p, pinv);
      }
    }
    t = { w, wq };
    twiddleCache.set(key, t);
  }
  return t;
}

/** The longest transform: every table prime is c·2^NTT_MAX_LOG + 1, so longer roots of unity need not exist. */
export const NTT_MAX_LENGTH = 2 ** NTT_MAX_LOG;

function addp(x: number, y: number, p: number): number {
  const s = x + y - p;
  return s + ((s >> 31) & p);
}

function subp(x: number, y: number, p: number): number {
  const d = x - y;
  return d + ((d >> 31) & p);
}

/**
 * Forward transform (decimation in frequency); the output is in bit-reversed order.
 * Stages go two at a time (radix 4: each element loaded and stored once per pair),
 * after one radix-2 stage when log₂n is odd.
 */
export function nttForward(a: Int32Array, prime: NttPrime): void {
  const p = prime.p | 0;
  const n = a.length;
  if (n > NTT_MAX_LENGTH) throw new RangeError(`internal: an NTT of length ${n} exceeds the primes' 2^${NTT_MAX_LOG}`);
  const { w, wq } = twiddles(prime, n, false);
  let half = n >> 1;
  if (half >= 1 && Math.log2(n) % 2 === 1) {
    for (let k = 0; k < half; k++) {
      const u = a[k]!;
      const v = a[k + half]!;
      a[k] = addp(u, v, p);
      a[k + half] = mulShoup(subp(u, v, p), w[half + k]!, wq[half + k]!, p);
    }
    half >>= 1;
  }
  for (; half >= 2; half >>= 2) {
    const q = half >> 1;
    for (let i = 0; i < n; i += 2 * half) {
      for (let k = 0; k < q; k++) {
        const i0 = i + k;
        const x0 = a[i0]!;
        const x1 = a[i0 + q]!;
        const x2 = a[i0 + 2 * q]!;
        const x3 = a[i0 + 3 * q]!;
        const y0 = addp(x0, x2, p);
        const y2 = mulShoup(subp(x0, x2, p), w[half + k]!, wq[half + k]!, p);
        const y1 = addp(x1, x3, p);
        const y3 = mulShoup(subp(x1, x3, p), w[half + k + q]!, wq[half + k + q]!, p);
        const wk = w[q + k]!;
        const wkq = wq[q + k]!;
        a[i0] = addp(y0, y1, p);
        a[i0 + q] = mulShoup(subp(y0, y1, p), wk, wkq, p);
        a[i0 + 2 * q] = addp(y2, y3, p);
        a[i0 + 3 * q] = mulShoup(subp(y2, y3, p), wk, wkq, p);
      }
    }
  }
}

/**
 * Inverse transform (decimation in time) of a bit-reversed input, times 1/n unless
 * `unscaled`; stages two at a time as in nttForward, the last one alone when log₂n is odd.
 */
export function nttInverse(a: Int32Array, prime: NttPrime, unscaled = false): void {
  const p = prime.p | 0;
  const n = a.length;
  if (n > NTT_MAX_LENGTH) throw new RangeError(`internal: an NTT of length ${n} exceeds the primes' 2^${NTT_MAX_LOG}`);
  const { w, wq } = twiddles(prime, n, true);
  let q = 1;
  for (; 4 * q <= n; q <<= 2) {
    for (let i = 0; i < n; i += 4 * q) {
      for (let k = 0; k < q; k++) {
        const i0 = i + k;
        const x0 = a[i0]!;
        const x2 = a[i0 + 2 * q]!;
        const t1 = mulShoup(a[i0 + q]!, w[q + k]!, wq[q + k]!, p);
        const t3 = mulShoup(a[i0 + 3 * q]!, w[q + k]!, wq[q + k]!, p);
        const y0 = addp(x0, t1, p);
        const y1 = subp(x0, t1, p);
        const y2 = addp(x2, t3, p);
        const y3 = subp(x2, t3, p);
        const t2 = mulShoup(y2, w[2 * q + k]!, wq[2 * q + k]!, p);
        const t4 = mulShoup(y3, w[3 * q + k]!, wq[3 * q + k]!, p);
        a[i0] = addp(y0, t2, p);
        a[i0 + 2 * q] = subp(y0, t2, p);
        a[i0 + q] = addp(y1, t4, p);
        a[i0 + 3 * q] = subp(y1, t4, p);
      }
    }
  }
  if (q < n) {
    // one radix-2 stage left (log₂n odd): half = q = n/2
    for (let k = 0; k < q; k++) {
      const u = a[k]!;
      const v = mulShoup(a[k + q]!, w[q + k]!, wq[q + k]!, p);
      a[k] = addp(u, v, p);
      a[k + q] = subp(u, v, p);
    }
  }
  if (!unscaled) scaleInPlace(a, invmod(n % p, p), p);
}

function scaleInPlace(a: Int32Array, c: number, p: number): void {
  const pinv = 1 / p;
  for (let i = 0; i < a.length; i++) a[i] = mulmod(a[i]!, c, p, pinv);
}

/** x·y mod p for residues x, y: mulmod.ts's method with branch-free corrections. */
function mulResidues(x: number, y: number, p: number, pinv: number): number {
  const q = Math.floor(x * y * pinv);
  let v = (Math.imul(x, y) - Math.imul(q, p)) | 0;
  v += (v >> 31) & p;
  v -= p;
  return v + ((v >> 31) & p);
}

/** fa ← fa·fb·c pointwise (c folds in the inverse transform's 1/n). */
export function pointwiseMultiply(fa: Int32Array, fb: Int32Array, c: number, p: number): void {
  const pinv = 1 / p;
  for (let i = 0; i < fa.length; i++) {
    const v = mulResidues(fa[i]!, fb[i]!, p, pinv);
    fa[i] = c === 1 ? v : mulResidues(v, c, p, pinv);
  }
}

/** t ← t^k·c pointwise, k ≥ 1 (c folds in the inverse transform's 1/n). */
export function pointwisePower(t: Int32Array, k: number, c: number, prime: NttPrime): void {
  const p = prime.p | 0;
  const pinv = 1 / p;
  for (let i = 0; i < t.length; i++) {
    let base = t[i]!;
    let r = c;
    for (let e = k; e > 0; e >>= 1) {
      if (e & 1) r = mulResidues(r, base, p, pinv);
      if (e > 1) base = mulResidues(base, base, p, pinv);
    }
    t[i] = r;
  }
}

/** The transform length for a product of lengths la and lb. */
export function transformLength(outLen: number): number {
  let n = 1;
  while (n < outLen) n <<= 1;
  return n;
}

/** The product of two residue vectors modulo p, of length |a| + |b| − 1. */
export function nttMultiply(a: Int32Array, b: Int32Array, prime: NttPrime): Int32Array {
  const outLen = a.length + b.length - 1;
  const n = transformLength(outLen);
  if (n > NTT_MAX_LENGTH) throw new RangeError(`internal: an NTT of length ${n} exceeds the primes' 2^${NTT_MAX_LOG}`);
  const fa = new Int32Array(n);
  fa.set(a);
  nttForward(fa, prime);
  // a square needs one forward transform, not two
  let fb = fa;
  if (b !== a) {
    fb = new Int32Array(n);
    fb.set(b);
    nttForward(fb, prime);
  }
  pointwiseMultiply(fa, fb, invmod(n % prime.p, prime.p), prime.p);
  nttInverse(fa, prime, true);
  return fa.subarray(0, outLen);
}
