/**
 * The Kronecker symbol (a/n) and fundamental discriminants, for safe integers.
 * Definitions after H. Cohen, *A Course in Computational Algebraic Number Theory*
 * (GTM 138, 1993), Def. 1.4.8 and §5.1: (a/0) = [a = ±1]; (a/−1) = sign of a (1 for
 * a = 0); (a/2) = 0 for even a, 1 for a ≡ ±1 (mod 8), −1 for a ≡ ±3 (mod 8); (a/p) the
 * Legendre symbol for odd primes p; completely multiplicative in n.
 */
import { mod } from '../series/integer.js';
import { factorize, isSquarefree } from './divisor-sums.js';

export type Sign = -1 | 0 | 1;

function requireSafeInteger(name: string, value: number): void {
  if (!Number.isSafeInteger(value)) throw new RangeError(`${name} must be a safe integer, got ${value}`);
}

/** (a/2): it depends on a mod 8 only. */
function kroneckerAtTwo(a: number): Sign {
  const r = mod(a, 8);
  if (r % 2 === 0) return 0;
  return r === 1 || r === 7 ? 1 : -1;
}

/**
 * The Jacobi symbol (a/n) for odd n > 0, by reciprocity and the supplement for 2
 * (Cohen, GTM 138, Alg. 1.4.10); it is periodic in a with period n, so a is reduced first.
 */
function jacobi(a: number, n: number): Sign {
  let x = mod(a, n);
  let m = n;
  let result: Sign = 1;
  while (x !== 0) {
    while (x % 2 === 0) {
      x /= 2;
      const r = m % 8;
      if (r === 3 || r === 5) result = result === 1 ? -1 : 1;
    }
    const swapped = x;
    x = m;
    m = swapped;
    if (x % 4 === 3 && m % 4 === 3) result = result === 1 ? -1 : 1;
    x %= m;
  }
  return m === 1 ? result : 0;
}

/** The Kronecker symbol (a/n) for all safe integers a, n (negative and 0 included). */
export function kronecker(a: number, n: number): Sign {
  requireSafeInteger('a', a);
  requireSafeInteger('n', n);
  if (n === 0) return a === 1 || a === -1 ? 1 : 0;
  let result: Sign = 1;
  let m = n;
  if (m < 0) {
    m = -m;
    if (a < 0) result = -1;
  }
  while (m % 2 === 0) {
    m /= 2;
    const factor = kroneckerAtTwo(a);
    if (factor === 0) return 0;
    if (factor === -1) result = result === 1 ? -1 : 1;
  }
  const odd = jacobi(a, m);
  return odd === 0 ? 0 : odd === result ? 1 : -1;
}

/**
 * (a/n) for n = 0..count at once. The symbol is completely multiplicative in n, so only
 * primes need the reciprocity loop; composites multiply the values at their smallest
 * prime factor and cofactor (sieve of Eratosthenes).
 */
export function kroneckerRow(a: number, count: number): Int8Array {
  requireSafeInteger('a', a);
  if (!Number.isSafeInteger(count) || count < 0) throw new RangeError(`count must be a non-negative safe integer, got ${count}`);
  const values = new Int8Array(count + 1);
  const smallestPrime = new Int32Array(count + 1);
  values[0] = kronecker(a, 0);
  if (count >= 1) values[1] = 1;
  for (let n = 2; n <= count; n++) {
    const p = smallestPrime[n]!;
    if (p !== 0) {
      values[n] = values[p]! * values[n / p]!;
      continue;
    }
    values[n] = kronecker(a, n);
    for (let m = n * n; m <= count; m += n) if (smallestPrime[m] === 0) smallestPrime[m] = n;
  }
  return values;
}

/**
 * Whether d is a fundamental discriminant: d ≡ 1 (mod 4) squarefree, or d = 4m with
 * m ≡ 2, 3 (mod 4) squarefree (Cohen, GTM 138, Def. 5.1.2). d = 1 counts: its character
 * is the trivial one, which Cohen's numbers H(r, N) need for square (−1)^r N.
 */
export function isFundamentalDiscriminant(d: number): boolean {
  requireSafeInteger('d', d);
  if (d === 0) return false;
  if (mod(d, 4) === 1) return isSquarefree(Math.abs(d));
  if (mod(d, 4) !== 0) return false;
  const m = d / 4;
  return (mod(m, 4) === 2 || mod(m, 4) === 3) && isSquarefree(Math.abs(m));
}

/** The largest g with g² | n (n ≥ 1). */
function largestSquareDivisorRoot(n: number): number {
  let root = 1;
  for (const [p, e] of factorize(n)) root *= p ** Math.floor(e / 2);
  return root;
}

/**
 * Writes a discriminant d (d ≡ 0, 1 mod 4, d ≠ 0) as d = D·f² with D fundamental and
 * f ≥ 1; the split is unique (Cohen, GTM 138, §5.1).
 */
export function fundamentalDiscriminantSplit(d: number): { D: number; f: number } {
  requireSafeInteger('d', d);
  if (d === 0 || (mod(d, 4) !== 0 && mod(d, 4) !== 1)) {
    throw new RangeError(`not a non-zero discriminant (≡ 0, 1 mod 4): ${d}`);
  }
  const g = largestSquareDivisorRoot(Math.abs(d));
  const squarefree = d / (g * g);
  if (mod(squarefree, 4) === 1) return { D: squarefree, f: g };
  // d ≡ 0, 1 (mod 4) with a squarefree part ≡ 2, 3 (mod 4) forces g to be even.
  return { D: 4 * squarefree, f: g / 2 };
}
