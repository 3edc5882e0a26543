/**
 * The primes of a modular proof (MATH.md §8): word-size NTT primes, largest first,
 * skipping any that divides a denominator met on the way, until their product M
 * exceeds 2^(b+1) ≥ 2H — compared exactly, in JSBI.
 */
import { JSBI, type Int, int, isZero } from '../integer.js';
import { tablePrimes, type NttPrime } from '../modular/ntt-primes.js';

export interface PrimeChoice {
  readonly primes: readonly NttPrime[];
  /** The product of the primes. */
  readonly product: Int;
}

export function choosePrimes(heightBits: number, avoid: Int): PrimeChoice | null {
  const need = JSBI.exponentiate(int(2), int(heightBits + 1));
  const chosen: NttPrime[] = [];
  let M = int(1);
  for (const pr of tablePrimes()) {
    if (JSBI.greaterThan(M, need)) break;
    if (isZero(JSBI.remainder(avoid, int(pr.p)))) continue;
    chosen.push(pr);
    M = JSBI.multiply(M, int(pr.p));
  }
  return JSBI.greaterThan(M, need) ? { primes: chosen, product: M } : null;
}
