/**
 * The number-theoretic transform modulo a word-size prime (iterative radix-2
 * Cooley–Tukey, in place, on Int32Array residues) and the cyclic product it gives:
 * a·b mod (p, x^n − 1) with n a power of two at least |a| + |b| − 1 is the full
 * product. Hot loops use only numbers and typed arrays (ARCHITECTURE.md); the modular
 * product in the butterfly is mulmod.ts's, inlined, with branch-free corrections
 * (`(v >> 31) & p` adds p exactly when v is negative).
 */
import { mulmod, powmod, invmod } from './mulmod.js';
import type { NttPrime } from './ntt-primes.js';

function bitReverse(a: Int32Array): void {
  const n = a.length;
  for (let i = 1, j = 0; i < n; i++) {
    let bit = n >> 1;
    for (; j & bit; bit >>= 1) j ^= bit;
    j ^= bit;
    if (i < j) {
      const t = a[i]!;
      a[i] = a[j]!;
      a[j] = t;
    }
  }
}

/** Powers of a primitive n-th root of unity (or its inverse), cached per prime and size. */
const twiddleCache = new Map<string, Int32Array>();

function twiddles(prime: NttPrime, n: number, inverse: boolean): Int32Array {
  const key = `${prime.p}:${n}:${inverse ? 1 : 0}`;
  let t = twiddleCache.get(key);
  if (t === undefined) {
    const { p } = prime;
    let w = powmod(prime.g, (p - 1) / n, p);
    if (inverse) w = invmod(w, p);
    t = new Int32Array(Math.max(1, n >> 1));
    t[0] = 1;
    for (let k = 1; k < t.length; k++) t[k] = mulmod(t[k - 1]!, w, p, 1 / p);
    twiddleCache.set(key, t);
  }
  return t;
}

export function ntt(a: Int32Array, prime: NttPrime, inverse: boolean): void {
  const { p } = prime;
  const pinv = 1 / p;
  const n = a.length;
  bitReverse(a);
  const table = twiddles(prime, n, inverse);
  for (let len = 2; len <= n; len <<= 1) {
    const half = len >> 1;
    // the len-th roots are every (n/len)-th entry of the n-th roots
    const stride = n / len;
    for (let i = 0; i < n; i += len) {
      for (let k = 0; k < half; k++) {
        const w = table[k * stride]!;
        const x = a[i + k + half]!;
        const q = (x * w * pinv) | 0;
        let v = (Math.imul(x, w) - Math.imul(q, p)) | 0;
        v += (v >> 31) & p;
        v -= p;
        v += (v >> 31) & p;
        const u = a[i + k]!;
        let s = u + v - p;
        s += (s >> 31) & p;
        let d = u - v;
        d += (d >> 31) & p;
        a[i + k] = s;
        a[i + k + half] = d;
      }
    }
  }
  if (inverse) {
    const ninv = invmod(n, p);
    for (let i = 0; i < n; i++) a[i] = mulmod(a[i]!, ninv, p, pinv);
  }
}

/** The product of two residue vectors modulo p, of length |a| + |b| − 1. */
export function nttMultiply(a: Int32Array, b: Int32Array, prime: NttPrime): Int32Array {
  const outLen = a.length + b.length - 1;
  let n = 1;
  while (n < outLen) n <<= 1;
  const fa = new Int32Array(n);
  fa.set(a);
  ntt(fa, prime, false);
  // a square needs one forward transform, not two
  let fb = fa;
  if (b !== a) {
    fb = new Int32Array(n);
    fb.set(b);
    ntt(fb, prime, false);
  }
  const { p } = prime;
  const pinv = 1 / p;
  for (let i = 0; i < n; i++) {
    const x = fa[i]!;
    const y = fb[i]!;
    const q = (x * y * pinv) | 0;
    let v = (Math.imul(x, y) - Math.imul(q, p)) | 0;
    v += (v >> 31) & p;
    v -= p;
    v += (v >> 31) & p;
    fa[i] = v;
  }
  ntt(fa, prime, true);
  return fa.subarray(0, outLen);
}
