/**
 * The dispatcher for products of dense integer polynomials (JSBI numerators):
 * schoolbook below KARATSUBA_CUTOFF, the multi-modular NTT route when the inputs are
 * long compared with the number of word primes their height needs, Karatsuba
 * otherwise. MODULAR_LENGTH_PER_PRIME and MODULAR_MIN_LENGTH were measured on this
 * machine (Node 20, 2 cores) by timing both routes on random polynomials of lengths
 * 32…1024 with 30-, 100-, 300- and 1000-bit coefficients (warm JIT, mean of two runs):
 * the modular route wins once the length exceeds about 24 times the number of primes
 * (e.g. 30-bit: from length 32; 300-bit: from 512).
 */
import type { Int } from './integer.js';
import { KARATSUBA_CUTOFF, polyMulSchoolbook, polyMulKaratsubaWith } from './karatsuba.js';
import { polyMulMultiModular, primeCountFor, heightBitsOf } from './modular/multi-modular-product.js';

export const MODULAR_LENGTH_PER_PRIME = 24;
export const MODULAR_MIN_LENGTH = 32;

export type PolyAlgorithm = 'schoolbook' | 'karatsuba' | 'modular';

export function choosePolyAlgorithm(a: readonly Int[], b: readonly Int[]): PolyAlgorithm {
  const short = Math.min(a.length, b.length);
  if (short < KARATSUBA_CUTOFF) return 'schoolbook';
  if (short >= MODULAR_MIN_LENGTH) {
    const k = primeCountFor(heightBitsOf(a, b));
    if (k !== null && short >= MODULAR_LENGTH_PER_PRIME * k) return 'modular';
  }
  return 'karatsuba';
}

export function polyMultiply(a: readonly Int[], b: readonly Int[]): Int[] {
  switch (choosePolyAlgorithm(a, b)) {
    case 'schoolbook':
      return polyMulSchoolbook(a, b);
    case 'modular':
      return polyMulMultiModular(a, b) ?? polyMulKaratsubaWith(a, b, polyMultiply);
    case 'karatsuba':
      return polyMulKaratsubaWith(a, b, polyMultiply);
  }
}
