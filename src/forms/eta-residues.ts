/**
 * η^e on the modular route (MATH.md §8). Residues: Euler's pentagonal series
 * Π(1 − qⁿ) = Σ_k (−1)^k q^{k(3k−1)/2} raised to e by Miller's recurrence, negative e
 * included. Majorants, for the cumulative sums C(N) of |coefficients| of Π(1 − qⁿ)^e
 * through q^N:
 * - e > 0: Π(1−qⁿ)^e = (Π(1−qⁿ)³)^⌊e/3⌋·Π(1−qⁿ)^(e mod 3), and Jacobi's identity
 *   Π(1−qⁿ)³ = Σ_{k≥0} (−1)^k (2k+1) q^{k(k+1)/2} gives C = (K+1)², K the largest k with
 *   k(k+1)/2 ≤ N; the pentagonal series gives C = #{k : k(3k−1)/2 ≤ N};
 * - e < 0: the coefficients are non-negative, so for every 0 < x < 1,
 *   C(N) ≤ Σ_n a_n x^(n−N) = x^(−N) Π_m (1 − x^m)^(−|e|) (Rankin's trick), evaluated at
 *   the saddle point x = exp(−π√(|e|/6(N+1))), with the tail of Σ −log(1 − x^m) bounded
 *   by x^(M+1)/((1 − x)(1 − x^(M+1))).
 */
import {
  type Rational,
  type ModularView,
  type ResidueSeries,
  type Majorant,
  type NttPrime,
  ONE,
  rat,
  rsub,
  rcmp,
  rfloor,
  toNumber,
  sliceCountTo,
  powerMillerResidues,
  zeroResidues,
  cachedView,
  up,
  ZERO_MAJORANT,
} from '../series/index.js';

function pentagonalResidues(rows: number, primes: readonly NttPrime[]): ResidueSeries {
  const data = primes.map(({ p }) => {
    const a = new Int32Array(rows);
    for (let k = 0; ; k++) {
      let any = false;
      for (const j of k === 0 ? [0] : [k, -k]) {
        const n = (j * (3 * j - 1)) / 2;
        if (n >= rows) continue;
        any = true;
        a[n] = k % 2 === 0 ? 1 : p - 1;
      }
      if (!any) break;
    }
    return a;
  });
  const exactTo = rat(rows - 1);
  return { primes, start: rat(0), qDen: 1, rows, exactTo, zLo: 0, zStep: 1, width: 1, data };
}

function pentagonalCount(N: number): number {
  let c = 1;
  for (let k = 1; (k * (3 * k - 1)) / 2 <= N; k++) c += (k * (3 * k + 1)) / 2 <= N ? 2 : 1;
  return c;
}

function jacobiCubeSum(N: number): number {
  let K = 0;
  while (((K + 1) * (K + 2)) / 2 <= N) K++;
  return (K + 1) * (K + 1);
}

/** log₂ of a bound of Σ_{n ≤ N} coefficients of Π(1 − qⁿ)^(−a), a > 0. */
function inverseLog2(a: number, N: number): number {
  if (N === 0) return 0;
  const t = Math.PI * Math.sqrt(a / (6 * (N + 1)));
  const x = Math.exp(-t);
  let s = 0;
  let xm = x;
  let m = 1;
  while (xm > 1e-18 * Math.max(s, 1e-300) && m < 1e7) {
    s += -Math.log1p(-xm);
    xm *= x;
    m++;
  }
  const tail = xm / ((1 - x) * (1 - xm));
  const lnC = N * t + a * (s + tail);
  return up(up(lnC) / Math.LN2);
}

function majorantLog2(e: number, N: number): number {
  if (e === 0) return 0;
  if (e < 0) return inverseLog2(-e, N);
  const cube = Math.floor(e / 3);
  return up(cube * Math.log2(jacobiCubeSum(N)) + (e % 3) * Math.log2(pentagonalCount(N)));
}

/** η^e's modular view; valuation e/24. */
export function etaPowerView(e: number): ModularView {
  const v = rat(e, 24);
  const steps = (X: Rational): number => toNumber(rfloor(rsub(X, v)));
  return cachedView({
    majorant(X): Majorant {
      if (rcmp(X, v) < 0) return ZERO_MAJORANT;
      return { log2: majorantLog2(e, steps(X)), den: ONE, avoid: ONE };
    },
    residues(X, primes) {
      if (rcmp(X, v) < 0) return zeroResidues(primes, v, 1, X);
      const rows = sliceCountTo(v, 1, X);
      const base = pentagonalResidues(rows, primes);
      const r = e === 1 ? base : powerMillerResidues(base, e, rsub(X, v));
      return { ...r, start: v, exactTo: X };
    },
    power: (k) => etaPowerView(e * k),
  });
}
