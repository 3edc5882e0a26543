/**
 * Exact products of integer polynomials through residues (MATH.md §8): with a proven
 * height bound H ≥ max |c_n| of the product — here H = max|a|·max|b|·min(|a|, |b|),
 * since each c_n is a sum of at most min(|a|, |b|) products — choose word-size primes
 * whose product M exceeds 2H; multiply modulo each prime by NTT; recover each c_n
 * from its residues by Garner's mixed-radix CRT (JSBI only here, at the end), taking
 * the representative in (−M/2, M/2]. Equality of residues under M > 2H is equality
 * over Z, so the result is exact.
 */
import { JSBI, type Int, ZERO, int, isZero } from '../integer.js';
import { garner } from './garner.js';
import { tablePrimes, NTT_MAX_LOG, type NttPrime } from './ntt-primes.js';
import { nttMultiply } from './ntt.js';

/**
 * An upper bound of the bit length of x, 0 for x = 0. Below 2^1024 the nearest double
 * has the same binary exponent or the next one up, so ⌊log2⌋ + 2 never falls short;
 * above, the hexadecimal digits are counted.
 */
export function bitLength(x: Int): number {
  if (isZero(x)) return 0;
  const n = Math.abs(JSBI.toNumber(x));
  if (Number.isFinite(n)) return Math.floor(Math.log2(n)) + 2;
  return x.toString(16).replace('-', '').length * 4;
}

function maxBits(a: readonly Int[]): number {
  let largest = 0;
  let huge = 0;
  for (const x of a) {
    const n = Math.abs(JSBI.toNumber(x));
    if (Number.isFinite(n)) largest = Math.max(largest, n);
    else huge = Math.max(huge, bitLength(x));
  }
  return Math.max(huge, largest === 0 ? 0 : Math.floor(Math.log2(largest)) + 2);
}

function residues(a: readonly Int[], prime: NttPrime): Int32Array {
  const { p } = prime;
  const P = int(p);
  const out = new Int32Array(a.length);
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    const n = JSBI.toNumber(x);
    let r = Number.isSafeInteger(n) ? n % p : JSBI.toNumber(JSBI.remainder(x, P));
    if (r < 0) r += p;
    out[i] = r;
  }
  return out;
}

/** Bits of the height bound of a·b: log2(max|a|·max|b|·min(|a|, |b|)), rounded up. */
export function heightBitsOf(a: readonly Int[], b: readonly Int[]): number {
  return maxBits(a) + maxBits(b) + Math.ceil(Math.log2(Math.min(a.length, b.length) + 1));
}

/** The number of primes a height needs, or null when the table is too short. */
export function primeCountFor(heightBits: number): number | null {
  return primesFor(heightBits)?.length ?? null;
}

/** How many primes make M > 2H, or null when more are needed than exist. */
export function primesFor(heightBits: number): NttPrime[] | null {
  const chosen: NttPrime[] = [];
  let bits = 0;
  // ⌊log2 p⌋ per prime never over-counts log2 M
  for (const pr of tablePrimes()) {
    if (bits >= heightBits + 2) break;
    chosen.push(pr);
    bits += Math.floor(Math.log2(pr.p));
  }
  return bits >= heightBits + 2 ? chosen : null;
}

/** a·b exactly, or null when the product is too long or too high for the prime table. */
export function polyMulMultiModular(a: readonly Int[], b: readonly Int[]): Int[] | null {
  if (a.length === 0 || b.length === 0) return [];
  const outLen = a.length + b.length - 1;
  if (outLen > 2 ** NTT_MAX_LOG) return null;
  const primes = primesFor(heightBitsOf(a, b));
  if (primes === null) return null;
  const rs = primes.map((pr) => {
    const ra = residues(a, pr);
    return nttMultiply(ra, a === b ? ra : residues(b, pr), pr);
  });
  const out = garner(rs, primes, outLen);
  for (let i = 0; i < outLen; i++) if (JSBI.equal(out[i]!, ZERO)) out[i] = ZERO;
  return out;
}
