/**
 * Word-size primes for number-theoretic transforms: p = c·2^20 + 1 < 2^30, so every
 * transform length up to 2^20 has a root of unity mod p. They are found largest first,
 * as far down as they are asked for (most proofs need a handful, and the whole table
 * cost 14 ms of every cold start), by the strong probable-prime test to the bases 2, 7
 * and 61, which no composite below 4 759 123 141 passes (Jaeschke, *On strong
 * pseudoprimes to several bases*, Math. Comp. 61 (1993)); each with a primitive root g
 * (g^((p−1)/f) ≠ 1 for every prime f | p − 1).
 */
import { powmod, mulmod } from './mulmod.js';

export const NTT_MAX_LOG = 20;

export interface NttPrime {
  readonly p: number;
  /** A primitive root modulo p. */
  readonly g: number;
}

/** Whether n passes the strong probable-prime test to base a (n odd, a < n < 2^30). */
function strongProbablePrime(n: number, a: number): boolean {
  let d = n - 1;
  let s = 0;
  while (d % 2 === 0) {
    d /= 2;
    s++;
  }
  let x = powmod(a, d, n);
  if (x === 1 || x === n - 1) return true;
  for (let r = 1; r < s; r++) {
    x = mulmod(x, x, n, 1 / n);
    if (x === n - 1) return true;
  }
  return false;
}

/** Primality of an odd n, 61 < n < 2^30 (see the header). */
export function isTablePrime(n: number): boolean {
  return strongProbablePrime(n, 2) && strongProbablePrime(n, 7) && strongProbablePrime(n, 61);
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

const STEP = 2 ** NTT_MAX_LOG;
const found: NttPrime[] = [];
let nextCandidate = Math.floor((2 ** 30 - 2) / STEP);

/** The i-th largest table prime (i from 0), or undefined past the last. */
export function nttPrime(i: number): NttPrime | undefined {
  while (found.length <= i && nextCandidate >= 1) {
    const p = nextCandidate * STEP + 1;
    nextCandidate--;
    // `| 0` keeps p a small integer in V8 (a double-valued field slows every loop using it by half)
    if (isTablePrime(p)) found.push({ p: p | 0, g: primitiveRoot(p) | 0 });
  }
  return found[i];
}

/** The table primes in order, each found when first asked for. */
export function* tablePrimes(): Generator<NttPrime> {
  for (let i = 0; ; i++) {
    const pr = nttPrime(i);
    if (pr === undefined) return;
    yield pr;
  }
}

/** All such primes, largest first (about a hundred). */
export function nttPrimes(): readonly NttPrime[] {
  for (let i = 0; nttPrime(i) !== undefined; i++);
  return found;
}
