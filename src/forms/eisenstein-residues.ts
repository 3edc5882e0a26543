/**
 * E_k on the modular route (MATH.md §8). Residues: σ_{k−1}(n) mod p by a divisor sieve,
 * times the constant c = −2k/B_k mod p (the primes avoid its denominator, 691 for
 * k = 12). Majorant: Σ_{n≤N} σ_{k−1}(n) = Σ_{d≤N} d^{k−1}⌊N/d⌋ ≤ N·Σ_{d≤N} d^{k−2} ≤ N^k,
 * so the cumulative sum of |coefficients| through q^N is at most 1 + |c|·N^k, which
 * bounds every block up to q^N.
 */
import {
  type Rational,
  type ModularView,
  type NttPrime,
  type ResidueSeries,
  rat,
  rcmp,
  rfloor,
  toNumber,
  sliceCountTo,
  zeroResidues,
  cachedView,
  powmod,
  mulmod,
  rationalResidue,
  log2UpperRational,
  up,
  zeroMajorant,
  majorantFromCumulative,
} from '../series/index.js';
import { eisensteinConstant } from './eisenstein.js';

function sigmaResidues(s: number, rows: number, p: number): Float64Array {
  const acc = new Float64Array(rows);
  for (let d = 1; d < rows; d++) {
    const x = powmod(d, s, p);
    for (let m = d; m < rows; m += d) acc[m] += x;
  }
  return acc;
}

function eisensteinResidues(k: number, rows: number, primes: readonly NttPrime[], X: Rational): ResidueSeries {
  const c = eisensteinConstant(k);
  const data = primes.map(({ p }) => {
    const cr = rationalResidue(c, p);
    const sig = sigmaResidues(k - 1, rows, p);
    const a = new Int32Array(rows);
    const pinv = 1 / p;
    if (rows > 0) a[0] = 1;
    for (let n = 1; n < rows; n++) a[n] = mulmod(cr, sig[n]! % p, p, pinv);
    return a;
  });
  return { primes, start: rat(0), qDen: 1, rows, exactTo: X, zLo: 0, zStep: 1, width: 1, data };
}

/** E_k's modular view (k even ≥ 2). */
export function eisensteinView(k: number): ModularView {
  const c = eisensteinConstant(k);
  return cachedView({
    majorant(X, h) {
      if (rcmp(X, rat(0)) < 0) return zeroMajorant(h);
      const cumulative = (x: Rational): number => {
        const N = toNumber(rfloor(x));
        if (N === 0) return 0;
        const tail = up(log2UpperRational(c) + k * Math.log2(N));
        return up(tail + Math.log2(1 + 2 ** -tail));
      };
      return majorantFromCumulative(h, rat(0), X, cumulative, c.den);
    },
    residues(X, primes) {
      if (rcmp(X, rat(0)) < 0) return zeroResidues(primes, rat(0), 1, X);
      return eisensteinResidues(k, sliceCountTo(rat(0), 1, X), primes, X);
    },
  });
}
