/**
 * E_k on the modular route (MATH.md §8). Residues: σ_{k−1}(n) mod p by a divisor sieve,
 * times the constant c = −2k/B_k mod p (the primes avoid its denominator, 691 for
 * k = 12). Majorant per block: the block's count of exponents times |c|·max σ_{k−1}(n)
 * over the block (log2SigmaBound), plus the constant term 1 in block 0.
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
  reduceDouble,
  rationalResidue,
  log2UpperRational,
  up,
  zeroMajorant,
  majorantFromLog2,
  withOffset,
} from '../series/index.js';
import { eisensteinConstant } from './eisenstein.js';

/**
 * σ_s(n) mod p for n < rows, as doubles in [0, d(n)·p). Each d^s mod p is built by s
 * steps x ← x·d mod p in exact doubles (x < 2^30, d < 2^23), cheaper than a modular
 * power for the small s of Eisenstein series.
 */
function sigmaResidues(s: number, rows: number, p: number): Float64Array {
  const acc = new Float64Array(rows);
  const pinv = 1 / p;
  const exact = rows < 2 ** 23;
  for (let d = 1; d < rows; d++) {
    let x = 1;
    if (exact) for (let i = 0; i < s; i++) x = reduceDouble(x * d, p, pinv);
    else x = powmod(d, s, p);
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
    for (let n = 1; n < rows; n++) a[n] = mulmod(cr, reduceDouble(sig[n]!, p, pinv), p, pinv);
    return a;
  });
  return { primes, start: rat(0), qDen: 1, rows, exactTo: X, zLo: 0, zStep: 1, width: 1, data };
}

/**
 * log₂ of a bound of σ_s(n) for every n ≤ m: σ_s(n) = n^s·Σ_{d|n} d^{−s} ≤ ζ(s)·m^s ≤
 * (1 + 1/(s − 1))·m^s for s ≥ 2 (comparing the sum with ∫_1^∞ x^{−s} dx); σ_1(n) ≤
 * n·(1 + ln n) (the harmonic sum).
 */
function log2SigmaBound(s: number, m: number): number {
  if (s === 1) return up(Math.log2(m) + Math.log2(1 + Math.log(m)));
  return up(Math.log2(1 + 1 / (s - 1)) + s * Math.log2(m));
}

/** E_k's modular view (k even ≥ 2). */
export function eisensteinView(k: number): ModularView {
  const c = eisensteinConstant(k);
  return cachedView({
    majorant(X, h) {
      if (rcmp(X, rat(0)) < 0) return zeroMajorant(h);
      const N = toNumber(rfloor(X));
      const logC = log2UpperRational(c);
      const blocks: number[] = [];
      for (let j = 0; j * h <= N; j++) {
        const lo = Math.max(1, j * h);
        const hi = Math.min(N, (j + 1) * h - 1);
        const constant = j === 0 ? 1 : 0;
        if (hi < lo) {
          blocks.push(constant === 1 ? 0 : -Infinity);
          continue;
        }
        const tail = up(logC + Math.log2(hi - lo + 1) + log2SigmaBound(k - 1, hi));
        blocks.push(constant === 1 ? up(tail + Math.log2(1 + 2 ** -tail)) : tail);
      }
      return withOffset(majorantFromLog2(h, 0, blocks, c.den, c.den), rat(0));
    },
    residues(X, primes) {
      if (rcmp(X, rat(0)) < 0) return zeroResidues(primes, rat(0), 1, X);
      return eisensteinResidues(k, sliceCountTo(rat(0), 1, X), primes, X);
    },
  });
}
