import { describe, expect, it } from 'vitest';
import { isPrime } from '../../src/forms/divisor-sums.js';
import {
  fundamentalDiscriminantSplit,
  isFundamentalDiscriminant,
  kronecker,
  kroneckerRow,
} from '../../src/forms/kronecker.js';
import { mod } from '../../src/series/integer.js';

const oddPrimes: number[] = [];
for (let p = 3; p < 200; p++) if (isPrime(p)) oddPrimes.push(p);

/** a^e mod m for small m, by repeated squaring in safe integers. */
function powMod(a: number, e: number, m: number): number {
  let result = 1;
  let base = mod(a, m);
  let exponent = e;
  while (exponent > 0) {
    if (exponent % 2 === 1) result = (result * base) % m;
    base = (base * base) % m;
    exponent = Math.floor(exponent / 2);
  }
  return result;
}

/** The Legendre symbol by Euler's criterion: a^{(p−1)/2} ≡ (a/p) (mod p) (Ireland–Rosen, *A Classical Introduction to Modern Number Theory*, ch. 5 §1). */
function legendreByEuler(a: number, p: number): number {
  const r = powMod(a, (p - 1) / 2, p);
  return r === 0 ? 0 : r === 1 ? 1 : -1;
}

/**
 * Fundamental by the definition that needs no case split: d ≡ 0, 1 (mod 4), d ≠ 0, and no
 * f > 1 with f² | d and d/f² ≡ 0, 1 (mod 4) (Cohen, GTM 138, §5.1; d = 1 included).
 */
function isFundamentalByDefinition(d: number): boolean {
  if (d === 0 || (mod(d, 4) !== 0 && mod(d, 4) !== 1)) return false;
  for (let f = 2; f * f <= Math.abs(d); f++) {
    if (d % (f * f) === 0 && (mod(d / (f * f), 4) === 0 || mod(d / (f * f), 4) === 1)) return false;
  }
  return true;
}

describe('kronecker', () => {
  it('is the Legendre symbol at odd primes (Euler criterion), for negative a too', () => {
    for (const p of oddPrimes) {
      for (let a = -2 * p; a <= 2 * p; a++) {
        expect(kronecker(a, p), `(${a}/${p})`).toBe(legendreByEuler(a, p)); // Ireland–Rosen, ch. 5 §1 (Euler's criterion)
      }
    }
  });

  it('satisfies quadratic reciprocity and both supplements', () => {
    for (const p of oddPrimes) {
      // Ireland–Rosen, ch. 5 §§1–3: (−1/p), (2/p) and the reciprocity law.
      expect(kronecker(-1, p)).toBe((p - 1) % 4 === 0 ? 1 : -1);
      expect(kronecker(2, p)).toBe(mod(p, 8) === 1 || mod(p, 8) === 7 ? 1 : -1);
      for (const q of oddPrimes) {
        if (q === p) continue;
        const sign = ((p - 1) / 2) * ((q - 1) / 2) % 2 === 0 ? 1 : -1;
        expect(kronecker(p, q) * kronecker(q, p), `p = ${p}, q = ${q}`).toBe(sign);
      }
    }
  });

  it('follows the rules at n = 0, −1 and 2', () => {
    // Cohen, GTM 138, Def. 1.4.8.
    expect([-2, -1, 0, 1, 2].map((a) => kronecker(a, 0))).toEqual([0, 1, 0, 1, 0]);
    expect([-5, -1, 0, 1, 7].map((a) => kronecker(a, -1))).toEqual([-1, -1, 1, 1, 1]);
    expect([-8, -3, -1, 0, 1, 3, 5, 7, 9, 15].map((a) => kronecker(a, 2))).toEqual([0, -1, 1, 0, 1, -1, -1, 1, 1, 1]);
  });

  it('is completely multiplicative in n (n of any sign) and in a for n > 0', () => {
    // Cohen, GTM 138, Def. 1.4.8 (multiplicative in n by definition) and Prop. 1.4.9 (in a).
    for (let a = -30; a <= 30; a++) {
      for (let m = -24; m <= 24; m++) {
        for (let n = -24; n <= 24; n++) {
          if (m === 0 || n === 0) continue;
          expect(kronecker(a, m * n), `(${a}/${m}·${n})`).toBe(kronecker(a, m) * kronecker(a, n) || 0);
        }
      }
    }
    for (let n = 1; n <= 60; n++) {
      for (let a = -20; a <= 20; a++) {
        for (let b = -20; b <= 20; b++) {
          expect(kronecker(a * b, n), `(${a}·${b}/${n})`).toBe(kronecker(a, n) * kronecker(b, n) || 0);
        }
      }
    }
  });

  it('gives the characters χ₋₄ and χ₁₂ of MATH.md §1–2 and a character mod |D| for fundamental D', () => {
    for (let n = -50; n <= 50; n++) {
      const chiMinus4 = n % 2 === 0 ? 0 : mod(n, 4) === 1 ? 1 : -1; // MATH.md §1
      expect(kronecker(-4, n), `χ₋₄(${n})`).toBe(chiMinus4); // (−4/−1) = −1 matches χ₋₄ being odd
      const r = mod(n, 12);
      const chi12 = r === 1 || r === 11 ? 1 : r === 5 || r === 7 ? -1 : 0; // MATH.md §2 (eta)
      expect(kronecker(12, n), `χ₁₂(${n})`).toBe(chi12); // (12/−1) = 1 matches χ₁₂ being even
    }
    // χ_D = (D/·) is a character mod |D| for fundamental D (Cohen, GTM 138, §5.1); periodicity checked directly.
    for (let D = -200; D <= 200; D++) {
      if (!isFundamentalDiscriminant(D)) continue;
      for (let n = 1; n <= 300; n++) expect(kronecker(D, n + Math.abs(D)), `(${D}/${n})`).toBe(kronecker(D, n));
    }
  });

  it('fills a row (a/0..count) equal to pointwise values', () => {
    for (const a of [-163, -84, -4, -3, -1, 0, 1, 2, 5, 8, 12, 60, 1001]) {
      const row = kroneckerRow(a, 600);
      for (let n = 0; n <= 600; n++) expect(row[n], `(${a}/${n})`).toBe(kronecker(a, n));
    }
  });

  it('handles large arguments', () => {
    const p = 1000000007; // prime (checked by isPrime below; (common practice, no source))
    expect(isPrime(p)).toBe(true);
    expect(kronecker(-1, p)).toBe(-1); // p ≡ 3 (mod 4), first supplement
    expect(kronecker(2 ** 52 + 1, 2 ** 30)).toBe(1); // (a/2)^30 with a odd
  });
});

describe('fundamental discriminants', () => {
  it('knows the first ones of each sign', () => {
    // (common practice, no source); confirmed by the brute-force definition in the next test.
    const negative = [-3, -4, -7, -8, -11, -15, -19, -20, -23, -24];
    const positive = [1, 5, 8, 12, 13, 17, 21, 24, 28, 29];
    const found: number[] = [];
    for (let d = -1; found.length < 10; d--) if (isFundamentalDiscriminant(d)) found.push(d);
    expect(found).toEqual(negative);
    found.length = 0;
    for (let d = 1; found.length < 10; d++) if (isFundamentalDiscriminant(d)) found.push(d);
    expect(found).toEqual(positive);
  });

  it('agrees with the definition and splits every discriminant d = D f²', () => {
    for (let d = -3000; d <= 3000; d++) {
      expect(isFundamentalDiscriminant(d), `d = ${d}`).toBe(isFundamentalByDefinition(d));
      if (d === 0 || (mod(d, 4) !== 0 && mod(d, 4) !== 1)) {
        expect(() => fundamentalDiscriminantSplit(d)).toThrow(RangeError);
        continue;
      }
      const { D, f } = fundamentalDiscriminantSplit(d);
      expect(D * f * f, `d = ${d}`).toBe(d);
      expect(isFundamentalByDefinition(D), `D of ${d}`).toBe(true);
    }
    expect(fundamentalDiscriminantSplit(-12)).toEqual({ D: -3, f: 2 }); // −12 = −3·2² (common practice, no source)
    expect(fundamentalDiscriminantSplit(-16)).toEqual({ D: -4, f: 2 }); // −16 = −4·2²
    expect(fundamentalDiscriminantSplit(32)).toEqual({ D: 8, f: 2 }); // 32 = 8·2²
    expect(fundamentalDiscriminantSplit(4)).toEqual({ D: 1, f: 2 }); // 4 = 1·2²
  });
});
