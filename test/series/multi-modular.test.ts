/**
 * The modular route against schoolbook (ARCHITECTURE.md: every multiplication algorithm
 * is tested against the naive one on seeded random inputs), including coefficients at
 * the height bound, negative values and the mulmod trick near 2^30.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { JSBI, type Int, polyMulSchoolbook } from '../../src/series/index.js';
import { polyMulMultiModular, primesFor, bitLength } from '../../src/series/modular/multi-modular-product.js';
import { mulmod, invmod, mulShoup, shoupQuotient } from '../../src/series/modular/mulmod.js';
import { nttPrimes } from '../../src/series/modular/ntt-primes.js';

const SEED = 61;

describe('word-size modular arithmetic', () => {
  it('mulmod agrees with exact products for residues near 2^30', () => {
    const primes = nttPrimes();
    expect(primes.length).toBeGreaterThan(40);
    fc.assert(
      fc.property(fc.integer({ min: 0, max: primes.length - 1 }), fc.nat(), fc.nat(), (i, x, y) => {
        const p = primes[i]!.p;
        const a = x % p;
        const b = y % p;
        const exact = Number((BigIntOf(a) * BigIntOf(b)) % BigIntOf(p));
        expect(mulmod(a, b, p, 1 / p)).toBe(exact);
        expect(mulmod(p - 1, p - 1, p, 1 / p)).toBe(1);
      }),
      { seed: SEED, numRuns: 2000 },
    );
  });
});

describe('Shoup\'s multiplication with a floating-point quotient rounded down', () => {
  const exact = (a: number, b: number, p: number): number => Number((BigIntOf(a) * BigIntOf(b)) % BigIntOf(p));
  it('agrees with exact products, random and at the edges: x·w ≡ p − 1, 0, 1 and x, w near p', () => {
    const primes = nttPrimes();
    fc.assert(
      fc.property(fc.integer({ min: 0, max: primes.length - 1 }), fc.integer({ min: 1, max: 2 ** 30 }), fc.nat(), (i, y, z) => {
        const p = primes[i]!.p;
        const w = 1 + (y % (p - 1));
        const wq = shoupQuotient(w, p);
        const winv = invmod(w, p);
        // x·w/p just below an integer (remainder p − 1), at one (remainder 0), just above (1)
        const xs = [z % p, 0, p - 1, mulmod(p - 1, winv, p, 1 / p), mulmod(1, winv, p, 1 / p), mulmod(p - 2, winv, p, 1 / p)];
        for (const x of xs) expect(mulShoup(x, w, wq, p)).toBe(exact(x, w, p));
      }),
      { seed: SEED, numRuns: 20000 },
    );
  });
  it('every x with x·w ≡ −1, −2, …, −200 (mod p) for the largest and smallest table primes', () => {
    const primes = nttPrimes();
    for (const { p } of [primes[0]!, primes[primes.length - 1]!]) {
      for (const w of [2, p - 1, (p - 1) / 2, 12345677]) {
        const wq = shoupQuotient(w, p);
        const winv = invmod(w, p);
        for (let r = 1; r <= 200; r++) {
          const x = mulmod(p - r, winv, p, 1 / p);
          expect(mulShoup(x, w, wq, p)).toBe(p - r);
        }
      }
    }
  });
});

/** Test-only conversion: the test oracle may use the language's integers. */
function BigIntOf(n: number): bigint {
  return BigInt(n);
}

describe('multi-modular products are exact', () => {
  const poly = (len: number, bits: number): fc.Arbitrary<Int[]> =>
    fc
      .array(fc.bigInt({ min: -(1n << BigInt(bits)), max: 1n << BigInt(bits) }), { minLength: len, maxLength: len })
      .map((xs) => xs.map((x) => JSBI.BigInt(x.toString())));
  it.each([
    [1, 5, 10],
    [40, 60, 20],
    [200, 300, 90],
    [700, 500, 300],
  ])('lengths %i × %i with %i-bit coefficients', (n, m, bits) => {
    fc.assert(
      fc.property(poly(n, bits), poly(m, bits), (a, b) => {
        const mod = polyMulMultiModular(a, b);
        expect(mod).not.toBeNull();
        expect(mod!.map(String)).toEqual(polyMulSchoolbook(a, b).map(String));
      }),
      { seed: SEED, numRuns: n > 100 ? 3 : 20 },
    );
  });
  it('coefficients at the height bound: all-maximal inputs give the extreme product', () => {
    const top = JSBI.subtract(JSBI.exponentiate(JSBI.BigInt(2), JSBI.BigInt(200)), JSBI.BigInt(1));
    const a = new Array<Int>(300).fill(top);
    const b = new Array<Int>(300).fill(JSBI.unaryMinus(top));
    expect(polyMulMultiModular(a, b)!.map(String)).toEqual(polyMulSchoolbook(a, b).map(String));
  });
  it('chooses enough primes: their product exceeds twice the height bound', () => {
    for (const bits of [1, 30, 61, 500, 2000]) {
      const primes = primesFor(bits)!;
      const logM = primes.reduce((s, p) => s + Math.log2(p.p), 0);
      expect(logM).toBeGreaterThan(bits + 1);
    }
    expect(bitLength(JSBI.BigInt(255))).toBeGreaterThanOrEqual(8); // an upper bound of the bit length
    expect(bitLength(JSBI.BigInt(255))).toBeLessThanOrEqual(9);
  });
});

describe('the dispatcher sends long products to the modular route, exactly', () => {
  it('long q-series products through Kronecker substitution agree with schoolbook', async () => {
    const { choosePolyAlgorithm } = await import('../../src/series/index.js');
    const { seriesArbitrary, seriesKey } = await import('../helpers/random-series.js');
    const { mulKronecker, mulSchoolbook } = await import('../../src/series/index.js');
    const long = seriesArbitrary({ slices: 400, width: 1, density: 0.9, bits: 50 });
    fc.assert(
      fc.property(long, long, (a, b) => {
        expect(seriesKey(mulKronecker(a, b))).toBe(seriesKey(mulSchoolbook(a, b)));
      }),
      { seed: SEED, numRuns: 3 },
    );
    const big = new Array<Int>(400).fill(JSBI.BigInt('123456789012345'));
    expect(choosePolyAlgorithm(big, big)).toBe('modular');
  });
});

describe('the NTT prime table', () => {
  it('holds primes p = c·2^20 + 1 < 2^30 with primitive roots (common practice, no source)', async () => {
    const { powmod } = await import('../../src/series/modular/mulmod.js');
    const primes = nttPrimes();
    for (const { p, g } of primes) {
      expect(p % 2 ** 20).toBe(1);
      expect(p).toBeLessThan(2 ** 30);
      for (let d = 2; d * d <= p; d += d === 2 ? 1 : 2) expect(p % d, `${p} divisible by ${d}`).not.toBe(0);
      // a primitive root is a quadratic non-residue: g^((p−1)/2) = −1
      expect(powmod(g, (p - 1) / 2, p)).toBe(p - 1);
    }
  });
});
