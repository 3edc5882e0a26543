/**
 * Divisor sums and the elementary multiplicative functions on safe integers:
 * σ_k(n) = Σ_{d|n} d^k (exact, JSBI), the Möbius function, divisors, primality.
 * σ_{k−1} gives the coefficients of the Eisenstein series E_k (MATH.md §2).
 */
import { JSBI, type Int, ZERO, int } from '../series/integer.js';

function requirePositiveInteger(name: string, n: number): void {
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`${name} must be a positive safe integer, got ${n}`);
}

function requireNaturalNumber(name: string, n: number): void {
  if (!Number.isSafeInteger(n) || n < 0) throw new RangeError(`${name} must be a non-negative safe integer, got ${n}`);
}

/** The prime factorisation of n ≥ 1 as [prime, exponent] pairs, by trial division. */
export function factorize(n: number): Array<[number, number]> {
  requirePositiveInteger('n', n);
  const factors: Array<[number, number]> = [];
  let rest = n;
  for (let p = 2; p * p <= rest; p += p === 2 ? 1 : 2) {
    let e = 0;
    while (rest % p === 0) {
      rest /= p;
      e++;
    }
    if (e > 0) factors.push([p, e]);
  }
  if (rest > 1) factors.push([rest, 1]);
  return factors;
}

/** The positive divisors of n ≥ 1 in increasing order. */
export function divisors(n: number): number[] {
  let result = [1];
  for (const [p, e] of factorize(n)) {
    const next: number[] = [];
    for (const d of result) {
      let power = 1;
      for (let i = 0; i <= e; i++) {
        next.push(d * power);
        power *= p;
      }
    }
    result = next;
  }
  return result.sort((x, y) => x - y);
}

/** Whether n is prime; trial division up to √n, enough for the sizes the checker meets. */
export function isPrime(n: number): boolean {
  if (!Number.isSafeInteger(n) || n < 2) return false;
  if (n < 4) return true;
  if (n % 2 === 0 || n % 3 === 0) return false;
  for (let p = 5; p * p <= n; p += 6) {
    if (n % p === 0 || n % (p + 2) === 0) return false;
  }
  return true;
}

/** The Möbius function μ(n), n ≥ 1. */
export function mobius(n: number): -1 | 0 | 1 {
  const factors = factorize(n);
  if (factors.some(([, e]) => e > 1)) return 0;
  return factors.length % 2 === 0 ? 1 : -1;
}

/** Whether no square > 1 divides n ≥ 1. */
export function isSquarefree(n: number): boolean {
  return mobius(n) !== 0;
}

/** σ_k(n) = Σ_{d|n} d^k for n ≥ 1, k ≥ 0, exactly. */
export function sigma(k: number, n: number): Int {
  requireNaturalNumber('k', k);
  const exponent = int(k);
  let sum = ZERO;
  for (const d of divisors(n)) sum = JSBI.add(sum, JSBI.exponentiate(int(d), exponent));
  return sum;
}

/**
 * σ_k(n) for 0 ≤ n ≤ nMax (entry 0 is 0), by adding d^k to every multiple of d: about
 * nMax·ln(nMax) additions, and only nMax powers.
 */
export function sigmaTable(k: number, nMax: number): Int[] {
  requireNaturalNumber('k', k);
  requireNaturalNumber('nMax', nMax);
  const table: Int[] = new Array<Int>(nMax + 1).fill(ZERO);
  const exponent = int(k);
  for (let d = 1; d <= nMax; d++) {
    const power = JSBI.exponentiate(int(d), exponent);
    for (let m = d; m <= nMax; m += d) table[m] = JSBI.add(table[m]!, power);
  }
  return table;
}
