/**
 * Chinese remaindering at the height bound and the choice of primes (MATH.md §8): Garner
 * returns the representative in (−M/2, M/2], so every integer strictly inside is
 * recovered, ±⌊(M−1)/2⌋ included, and nothing beyond; `choosePrimes` must cover twice
 * the height and skip every prime dividing a denominator.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  type Int,
  type NttPrime,
  JSBI,
  int,
  garner,
  nttPrimes,
  choosePrimes,
  heightBitsOf,
  residueOf,
  powmod,
} from '../../../src/series/index.js';
import { isTablePrime } from '../../../src/series/modular/ntt-primes.js';
import { isPrime, factorize } from '../../../src/forms/divisor-sums.js';
import { primeSetArb } from './residue-helpers.js';

const SEED = 1729;

function productOf(primes: readonly NttPrime[]): Int {
  return primes.reduce<Int>((m, p) => JSBI.multiply(m, int(p.p)), int(1));
}

/** Residues in [0, p) computed with JSBI only (independent of residueOf). */
function residuesOf(values: readonly Int[], primes: readonly NttPrime[]): Int32Array[] {
  return primes.map(({ p }) => {
    const P = int(p);
    return Int32Array.from(values.map((v) => {
      const r = JSBI.remainder(v, P);
      return JSBI.toNumber(JSBI.lessThan(r, int(0)) ? JSBI.add(r, P) : r);
    }));
  });
}

function recover(values: readonly Int[], primes: readonly NttPrime[]): string[] {
  return garner(residuesOf(values, primes), primes, values.length).map(String);
}

describe('Garner at the height bound', () => {
  it.each([
    [3, 200],
    [4, 100],
    [20, 40],
  ])('recovers ±(M/2 − t) and exactly ±⌊(M−1)/2⌋ for 1 … %i primes in any order', (count, runs) => {
    fc.assert(
      fc.property(primeSetArb(count), fc.array(fc.nat({ max: 1000 }), { minLength: 1, maxLength: 8 }), (primes, ts) => {
        const M = productOf(primes);
        const half = JSBI.divide(JSBI.subtract(M, int(1)), int(2)); // M is odd: ⌊(M−1)/2⌋ = (M−1)/2
        const values: Int[] = [half, JSBI.unaryMinus(half), int(0), int(1), int(-1)];
        for (const t of ts) values.push(JSBI.subtract(half, int(t)), JSBI.unaryMinus(JSBI.subtract(half, int(t))));
        expect(recover(values, primes)).toEqual(values.map(String));
      }),
      { seed: SEED, numRuns: runs },
    );
  });

  it('recovers random integers of every size below M/2, both signs', () => {
    fc.assert(
      fc.property(primeSetArb(4), fc.array(fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.boolean()), { minLength: 1, maxLength: 20 }), (primes, xs) => {
        const M = productOf(primes);
        const half = JSBI.divide(M, int(2));
        // x = ⌊u·(M/2)⌋ with u uniform in [0, 1): a random fraction of the bound, 2^−20 resolution
        const values = xs.map(([u, neg]) => {
          const v = JSBI.divide(JSBI.multiply(half, int(Math.floor(u * 2 ** 20))), int(2 ** 20));
          return neg ? JSBI.unaryMinus(v) : v;
        });
        expect(recover(values, primes)).toEqual(values.map(String));
      }),
      { seed: SEED, numRuns: 200 },
    );
  });

  it('does not recover anything at or beyond M/2: (M+1)/2 comes back as −(M−1)/2, M as 0', () => {
    for (const count of [1, 2, 3]) {
      const primes = nttPrimes().slice(5, 5 + count);
      const M = productOf(primes);
      const half = JSBI.divide(JSBI.subtract(M, int(1)), int(2));
      const beyond = [JSBI.add(half, int(1)), JSBI.unaryMinus(JSBI.add(half, int(1))), M, JSBI.add(M, int(7)), JSBI.multiply(M, int(-3))];
      const got = recover(beyond, primes);
      expect(got).toEqual([JSBI.unaryMinus(half), half, int(0), int(7), int(0)].map(String));
      // so a bound ignored by one bit would give wrong coefficients
      got.forEach((g, i) => expect(g).not.toBe(String(beyond[i])));
    }
  });

  it('residueOf agrees with the JSBI remainder for huge and negative integers', () => {
    const primes = nttPrimes().slice(0, 3);
    const big = JSBI.exponentiate(int(-7), int(101));
    const values = [big, JSBI.unaryMinus(big), int(-1), int(2 ** 53 - 1), int(-(2 ** 53) + 1)];
    const want = residuesOf(values, primes);
    primes.forEach(({ p }, i) => expect(values.map((v) => residueOf(v, p))).toEqual([...want[i]!]));
  });
});

describe('choosePrimes', () => {
  it('covers 2^(b+1) with the product of the primes chosen, largest first', () => {
    for (const bits of [0, 1, 2, 27, 28, 29, 30, 57, 58, 59, 60, 100, 500, 1000, 2500]) {
      const choice = choosePrimes(bits, int(1));
      expect(choice, `bits ${bits}`).not.toBeNull();
      const M = productOf(choice!.primes);
      expect(JSBI.greaterThan(M, JSBI.exponentiate(int(2), int(bits + 1))), `bits ${bits}`).toBe(true);
      expect(choice!.primes).toEqual(nttPrimes().slice(0, choice!.primes.length));
      // and no more than needed: without the last prime the product would not do
      const fewer = productOf(choice!.primes.slice(0, -1));
      expect(JSBI.greaterThan(fewer, JSBI.exponentiate(int(2), int(bits + 1)))).toBe(false);
    }
  });

  it('skips every prime dividing `avoid`', () => {
    const table = nttPrimes();
    fc.assert(
      fc.property(fc.uniqueArray(fc.integer({ min: 0, max: 12 }), { minLength: 1, maxLength: 5 }), fc.integer({ min: 1, max: 400 }), (skip, bits) => {
        let avoid: Int = int(691 * 4);
        for (const i of skip) avoid = JSBI.multiply(avoid, int(table[i]!.p));
        const choice = choosePrimes(bits, avoid)!;
        expect(choice).not.toBeNull();
        for (const pr of choice.primes) expect(JSBI.toNumber(JSBI.remainder(avoid, int(pr.p)))).not.toBe(0);
        for (const i of skip) expect(choice.primes).not.toContain(table[i]);
        expect(JSBI.greaterThan(productOf(choice.primes), JSBI.exponentiate(int(2), int(bits + 1)))).toBe(true);
      }),
      { seed: SEED, numRuns: 100 },
    );
  });

  it('returns null when the whole table cannot cover the height', () => {
    const total = nttPrimes().reduce((s, p) => s + Math.log2(p.p), 0);
    expect(choosePrimes(Math.ceil(total) + 2, int(1))).toBeNull();
    // a table without its first prime falls short one prime earlier
    const first = int(nttPrimes()[0]!.p);
    const justEnough = Math.floor(total) - 3;
    expect(choosePrimes(justEnough, int(1))).not.toBeNull();
    expect(choosePrimes(justEnough, first)).toBeNull();
  });

  it('heightBitsOf: 2^b bounds D·2^l', () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 3000, noNaN: true }), fc.integer({ min: 1, max: 10 ** 9 }), (l, d) => {
        const b = heightBitsOf(l, int(d));
        expect(b).toBeGreaterThanOrEqual(0);
        expect(b).toBeGreaterThanOrEqual(l + Math.log2(d));
      }),
      { seed: SEED, numRuns: 300 },
    );
    expect(heightBitsOf(-Infinity, int(691))).toBe(0);
  });
});

describe('the table of NTT primes', () => {
  it('is every prime c·2^20 + 1 below 2^30, largest first, by trial division (forms/divisor-sums.ts)', () => {
    const want: number[] = [];
    for (let c = 1023; c >= 1; c--) if (isPrime(c * 2 ** 20 + 1)) want.push(c * 2 ** 20 + 1);
    expect(nttPrimes().map((pr) => pr.p)).toEqual(want);
    // 998244353 = 119·2^23 + 1 is the best-known NTT prime (common practice, no source)
    expect(want).toContain(998244353);
  });
  it('the strong-probable-prime test agrees with trial division on every candidate c·2^20 + 1', () => {
    for (let c = 1; c < 1024; c++) {
      const n = c * 2 ** 20 + 1;
      expect(isTablePrime(n), `n = ${n}`).toBe(isPrime(n));
    }
  });
  it('each has a primitive root: g^((p−1)/f) ≠ 1 for every prime f of p − 1', () => {
    for (const { p, g } of nttPrimes()) {
      for (const [f] of factorize(p - 1)) expect(powmod(g, (p - 1) / f, p), `p = ${p}, f = ${f}`).not.toBe(1);
    }
  });
});
