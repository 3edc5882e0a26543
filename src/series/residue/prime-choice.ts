/**
 * The primes of a modular proof (MATH.md §8): word-size NTT primes, largest first,
 * skipping any that divides a denominator met on the way, until their product M
 * exceeds 2^(b+1) ≥ 2H. ⌊log₂ p⌋ per prime never over-counts log₂ M.
 */
import { JSBI, type Int, int, isZero } from '../integer.js';
import { nttPrimes, type NttPrime } from '../modular/ntt-primes.js';

export interface PrimeChoice {
  readonly primes: readonly NttPrime[];
  /** Σ ⌊log₂ p⌋ ≤ log₂ M. */
  readonly bits: number;
}

export function choosePrimes(heightBits: number, avoid: Int): PrimeChoice | null {
  const chosen: NttPrime[] = [];
  let bits = 0;
  for (const pr of nttPrimes()) {
    if (bits >= heightBits + 2) break;
    if (isZero(JSBI.remainder(avoid, int(pr.p)))) continue;
    chosen.push(pr);
    bits += Math.floor(Math.log2(pr.p));
  }
  return bits >= heightBits + 2 ? { primes: chosen, bits } : null;
}
