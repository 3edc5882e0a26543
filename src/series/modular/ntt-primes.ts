/**
 * Word-size primes for number-theoretic transforms: p = c·2^20 + 1 < 2^30, so every
 * transform length up to 2^20 has a root of unity mod p. They are found once, by
 * trial division, largest first, each with a primitive root g (g^((p−1)/f) ≠ 1 for
 * every prime f | p − 1).
 */
import { powmod } from './mulmod.js';

export const NTT_MAX_LOG = 20;

export interface NttPrime {
  readonly p: number;
  /** A primitive root modulo p. */
  readonly g: number;
}

/** The primes up to √(2^30) by a sieve, for trial division of the candidates. */
function smallPrimes(limit: number): number[] {
  const composite = new Uint8Array(limit + 1);
  const out: number[] = [];
  for (let i = 2; i <= limit; i++) {
    if (composite[i]) continue;
    out.push(i);
    for (let j = i * i; j <= limit; j += i) composite[j] = 1;
  }
  return out;
}

function isPrime(n: number, divisors: readonly number[]): boolean {
  if (n < 2) return false;
  for (const d of divisors) {
    if (d * d > n) return true;
    if (n % d === 0) return n === d;
  }
  return true;
}

function primeFactors(n: number): number[] {
  const out: number[] = [];
  let m = n;
  for (let d = 2; d * d <= m; d++) {
    if (m % d === 0) {
      out.push(d);
      while (m % d === 0) m /= d;
    }
  }
  if (m > 1) out.push(m);
  return out;
}

function primitiveRoot(p: number): number {
  const fs = primeFactors(p - 1);
  for (let g = 2; ; g++) if (fs.every((f) => powmod(g, (p - 1) / f, p) !== 1)) return g;
}

let cache: NttPrime[] | null = null;

/** All such primes, largest first (about a hundred). */
export function nttPrimes(): readonly NttPrime[] {
  if (cache !== null) return cache;
  const out: NttPrime[] = [];
  const step = 2 ** NTT_MAX_LOG;
  const divisors = smallPrimes(2 ** 15);
  for (let c = Math.floor((2 ** 30 - 2) / step); c >= 1; c--) {
    const p = c * step + 1;
    // `| 0` keeps p a small integer in V8 (a double-valued field slows every loop using it by half)
    if (isPrime(p, divisors)) out.push({ p: p | 0, g: primitiveRoot(p) | 0 });
  }
  cache = out;
  return out;
}
