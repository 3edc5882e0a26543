import { oeisIntegers as oeisTerms } from '../helpers/oeis.js';
import { describe, expect, it } from 'vitest';
import { divisors, factorize, isPrime, isSquarefree, mobius, sigma, sigmaTable } from '../../src/forms/divisor-sums.js';
import { JSBI, type Int, gcdNumber, int } from '../../src/series/integer.js';


/** Primes below n by the sieve of Eratosthenes, as an independent primality oracle. */
function sieve(n: number): boolean[] {
  const prime = new Array<boolean>(n).fill(true);
  prime[0] = false;
  prime[1] = false;
  for (let p = 2; p * p < n; p++) if (prime[p]) for (let m = p * p; m < n; m += p) prime[m] = false;
  return prime;
}

describe('sigma', () => {
  it('matches σ_3 (OEIS A001158) and σ_5 (OEIS A001160)', () => {
    const s3 = oeisTerms('A001158'); // OEIS A001158, offset 1
    s3.forEach((t, i) => expect(sigma(3, i + 1).toString(), `σ_3(${i + 1})`).toBe(t.toString()));
    const s5 = oeisTerms('A001160'); // OEIS A001160, offset 1
    s5.forEach((t, i) => expect(sigma(5, i + 1).toString(), `σ_5(${i + 1})`).toBe(t.toString()));
  });

  it('gives the Eisenstein coefficients of E_2 … E_14', () => {
    // a(n) = c·σ_{k−1}(n) for n ≥ 1 with c = a(1), per the %N/%F lines listed in the OEIS INDEX.md.
    const files: Array<[number, string]> = [
      [1, 'A006352'], // OEIS A006352: E_2 = 1 − 24 Σ σ_1(n) qⁿ
      [3, 'A004009'], // OEIS A004009: E_4 = 1 + 240 Σ σ_3(n) qⁿ
      [5, 'A013973'], // OEIS A013973: E_6 = 1 − 504 Σ σ_5(n) qⁿ
      [7, 'A008410'], // OEIS A008410: a(n) = 480 σ_7(n)
      [9, 'A013974'], // OEIS A013974: E_10 = 1 − 264 Σ σ_9(n) qⁿ
      [11, 'A029828'], // OEIS A029828: 691·E_12 = 691 + 65520 Σ σ_11(n) qⁿ
      [13, 'A058550'], // OEIS A058550: E_14 = 1 − 24 Σ σ_13(n) qⁿ
    ];
    for (const [k, file] of files) {
      const terms = oeisTerms(file);
      const table = sigmaTable(k, terms.length - 1);
      for (let n = 1; n < terms.length; n++) {
        expect(JSBI.multiply(terms[1]!, table[n]!).toString(), `${file}(${n})`).toBe(terms[n]!.toString());
      }
    }
  });

  it('is multiplicative, and the table agrees with the pointwise value', () => {
    for (const k of [0, 1, 2, 7, 13]) {
      const table = sigmaTable(k, 400);
      expect(table[0]!.toString()).toBe('0');
      for (let n = 1; n <= 400; n++) expect(table[n]!.toString(), `σ_${k}(${n})`).toBe(sigma(k, n).toString());
      for (let m = 1; m <= 20; m++) {
        for (let n = 1; n <= 20; n++) {
          // σ_k is multiplicative (common practice, no source).
          if (gcdNumber(m, n) !== 1) continue;
          expect(sigma(k, m * n).toString()).toBe(JSBI.multiply(sigma(k, m), sigma(k, n)).toString());
        }
      }
    }
    expect(sigma(0, 12).toString()).toBe('6'); // 12 has 6 divisors (common practice, no source)
  });

  it('tabulates σ_13 up to 20000 in well under two seconds', () => {
    const start = performance.now();
    const table = sigmaTable(13, 20000);
    const elapsed = performance.now() - start;
    expect(elapsed).toBeLessThan(2000);
    // σ_13(p) = 1 + p^13 for the prime p = 19997 (isPrime confirms it).
    expect(isPrime(19997)).toBe(true);
    expect(table[19997]!.toString()).toBe(JSBI.add(int(1), JSBI.exponentiate(int(19997), int(13))).toString());
    expect(table[20000]!.toString()).toBe(sigma(13, 20000).toString());
  });
});

describe('divisors, mobius, isPrime', () => {
  it('lists divisors in increasing order', () => {
    for (let n = 1; n <= 1000; n++) {
      const brute: number[] = [];
      for (let d = 1; d <= n; d++) if (n % d === 0) brute.push(d);
      expect(divisors(n), `n = ${n}`).toEqual(brute);
    }
    expect(() => divisors(0)).toThrow(RangeError);
  });

  it('has Σ_{d|n} μ(d) = [n = 1] (Möbius inversion)', () => {
    // Ireland–Rosen, *A Classical Introduction to Modern Number Theory*, ch. 2 §2.
    for (let n = 1; n <= 2000; n++) {
      const total = divisors(n).reduce((s, d) => s + mobius(d), 0);
      expect(total, `n = ${n}`).toBe(n === 1 ? 1 : 0);
    }
    expect([1, 2, 3, 4, 5, 6, 30, 12].map(mobius)).toEqual([1, -1, -1, 0, -1, 1, -1, 0]); // (common practice, no source)
    expect([1, 2, 4, 6, 8, 9, 10, 12, 30].map(isSquarefree)).toEqual([true, true, false, true, false, false, true, false, true]);
  });

  it('agrees with the sieve of Eratosthenes and π(10⁴) = 1229', () => {
    const prime = sieve(10000);
    let count = 0;
    for (let n = -5; n < 10000; n++) {
      expect(isPrime(n), `n = ${n}`).toBe(n >= 0 && prime[n] === true);
      if (isPrime(n)) count++;
    }
    expect(count).toBe(1229); // π(10⁴) = 1229 (common practice, no source); the sieve confirms it above
    expect(isPrime(2147483647)).toBe(true); // 2^31 − 1, Euler's Mersenne prime (common practice, no source)
    expect(isPrime(2147483649)).toBe(false); // = 3 · 715827883
  });

  it('factorizes', () => {
    expect(factorize(360)).toEqual([
      [2, 3],
      [3, 2],
      [5, 1],
    ]);
    expect(factorize(1)).toEqual([]);
    for (let n = 1; n <= 2000; n++) {
      const product = factorize(n).reduce((acc, [p, e]) => acc * p ** e, 1);
      expect(product).toBe(n);
      for (const [p] of factorize(n)) expect(isPrime(p)).toBe(true);
    }
  });
});
