/**
 * η^e on the modular route (MATH.md §8). Residues: Euler's pentagonal series
 * Π(1 − qⁿ) = Σ_k (−1)^k q^{k(3k−1)/2} raised to e by Miller's recurrence, negative e
 * included. Majorants (per block, see series/residue/majorant.ts):
 * - e > 0: η^e = (η³)^⌊e/3⌋·η^(e mod 3), the product rule applied to the exact block
 *   sums of Jacobi's η³ = Σ_{k≥0} (−1)^k (2k+1) q^{1/8 + k(k+1)/2} and of Euler's series;
 * - e < 0: the coefficients of Π(1 − qⁿ)^e are non-negative, so they are their own
 *   majorant: computed in doubles where that is cheap (inverseEtaBlocks); otherwise the
 *   cumulative sums are bounded by Rankin's trick, for every 0 < x < 1
 *   C(N) ≤ Σ_n a_n x^(n−N) = x^(−N) Π_m (1 − x^m)^(−|e|), evaluated at the saddle point
 *   x = exp(−π√(|e|/6(N+1))), with the tail of Σ −log(1 − x^m) bounded by
 *   x^(M+1)/((1 − x)(1 − x^(M+1))).
 */
import {
  type Rational,
  type ModularView,
  type ResidueSeries,
  type Majorant,
  type FactorMajorant,
  type NttPrime,
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
  zeroMajorant,
  blockOf,
  majorantFromLog2,
  withOffset,
  majorantFromCumulative,
  majorantPower,
  majorantProduct,
  radd,
  type IntegerGrid,
  multiplyIntegers,
  sumAbs,
  EXACT_LIMIT,
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

/** η³ = Σ_{k≥0} (−1)^k (2k+1) q^{1/8 + k(k+1)/2} (Jacobi), or η = Σ_k (−1)^k q^{1/24 + k(3k−1)/2} (Euler), to X, as exact block sums. */
function sparseEtaMajorant(cube: boolean, X: Rational, h: number): Majorant {
  const v = rat(cube ? 3 : 1, 24);
  const first = blockOf(v, h);
  const last = blockOf(X, h);
  const sums = new Array<number>(Math.max(0, last - first + 1)).fill(0);
  const N = toNumber(rfloor(rsub(X, v)));
  const add = (n: number, c: number): void => {
    if (n > N) return;
    sums[blockOf(radd(v, rat(n)), h) - first] += c;
  };
  if (cube) for (let k = 0; (k * (k + 1)) / 2 <= N; k++) add((k * (k + 1)) / 2, 2 * k + 1);
  else {
    add(0, 1);
    for (let k = 1; (k * (3 * k - 1)) / 2 <= N; k++) {
      add((k * (3 * k - 1)) / 2, 1);
      add((k * (3 * k + 1)) / 2, 1);
    }
  }
  // block sums are integers below 2^53: exact in doubles
  return withOffset(majorantFromLog2(h, first, sums.map((x) => (x === 0 ? -Infinity : up(Math.log2(x))))), v);
}

/** Up to this many q-steps 1/η^a is majorised by its own coefficients (O(N²) doubles). */
const INVERSE_EXACT_STEPS = 4000;

/**
 * The coefficients b_n of Π(1 − qⁿ)^(−a) in doubles by the recurrence of the logarithmic
 * derivative, n·b_n = a·Σ_{j=1..n} σ(j)·b_{n−j} (Apostol, *Introduction to analytic number
 * theory*, Thm 14.8, for a = 1; the same proof for any a). Every term is positive, so
 * each b_n carries a relative rounding error at most the previous ones' plus (n + 3)·2^−53,
 * in all below (N + 3)²·2^−53: the block sums are rounded up by that factor. The caller
 * keeps them below 2^1000 (Rankin's bound), far from overflow.
 */
function inverseEtaBlocks(a: number, N: number, v: Rational, h: number): Majorant {
  const sigma = new Float64Array(N + 1);
  for (let d = 1; d <= N; d++) for (let m = d; m <= N; m += d) sigma[m] += d;
  const b = new Float64Array(N + 1);
  b[0] = 1;
  for (let n = 1; n <= N; n++) {
    let s = 0;
    for (let j = 1; j <= n; j++) s += sigma[j]! * b[n - j]!;
    b[n] = (a * s) / n;
  }
  const first = blockOf(v, h);
  const sums = new Array<number>(blockOf(radd(v, rat(N)), h) - first + 1).fill(0);
  for (let n = 0; n <= N; n++) sums[blockOf(radd(v, rat(n)), h) - first] += b[n]!;
  const margin = 1 + (N + 3) * (N + 3) * 2 ** -52;
  return withOffset(majorantFromLog2(h, first, sums.map((x) => (x === 0 ? -Infinity : up(Math.log2(x * margin))))), v);
}

/**
 * The majorant of η^e to X: for e > 0 the product rule applied to
 * (η³)^⌊e/3⌋·η^(e mod 3), from the exact block sums of the two sparse series; for
 * e < 0 the coefficients themselves (non-negative) where they are cheap, else Rankin's
 * bound of the cumulative sums, block by block.
 */
function etaMajorant(e: number, X: Rational, h: number): Majorant {
  if (e < 0) {
    const v = rat(e, 24);
    const N = toNumber(rfloor(rsub(X, v)));
    if (N <= INVERSE_EXACT_STEPS && inverseLog2(-e, N) < 1000) return inverseEtaBlocks(-e, N, v, h);
    return majorantFromCumulative(h, v, X, (x) => inverseLog2(-e, toNumber(rfloor(rsub(x, v)))));
  }
  const parts: FactorMajorant[] = [];
  const cubes = Math.floor(e / 3);
  // each factor is needed to X minus the other's valuation (positive here, so X serves)
  if (cubes > 0) parts.push({ majorant: majorantPower(sparseEtaMajorant(true, X, h), cubes, rat(1, 8), X), valuation: rat(cubes, 8) });
  if (e % 3 !== 0) parts.push({ majorant: majorantPower(sparseEtaMajorant(false, X, h), e % 3, rat(1, 24), X), valuation: rat(e % 3, 24) });
  return majorantProduct(parts, X);
}

/**
 * Jacobi's cube Π(1 − qⁿ)³ = Σ_{k≥0} (−1)^k (2k+1) q^{k(k+1)/2} or Euler's Π(1 − qⁿ) =
 * Σ_k (−1)^k q^{k(3k−1)/2}, to N q-steps, in doubles (integers far below 2^52).
 */
function sparseUnit(cube: boolean, N: number): Float64Array {
  const u = new Float64Array(N + 1);
  if (cube) for (let k = 0; (k * (k + 1)) / 2 <= N; k++) u[(k * (k + 1)) / 2] = k % 2 === 0 ? 2 * k + 1 : -(2 * k + 1);
  else {
    u[0] = 1;
    for (let k = 1; (k * (3 * k - 1)) / 2 <= N; k++) {
      const s = k % 2 === 0 ? 1 : -1;
      u[(k * (3 * k - 1)) / 2] = s;
      if ((k * (3 * k + 1)) / 2 <= N) u[(k * (3 * k + 1)) / 2] = s;
    }
  }
  return u;
}

/** Π(1 − qⁿ)^a (a > 0) as sparse units: ⌊a/3⌋ cubes and (a mod 3) of Euler's series. */
function etaUnits(a: number, N: number): Float64Array[] {
  const units: Float64Array[] = [];
  for (let i = 0; i < Math.floor(a / 3); i++) units.push(sparseUnit(true, N));
  for (let i = 0; i < a % 3; i++) units.push(sparseUnit(false, N));
  return units;
}

/** η^e for e ≥ 0 as exact integers to X, from its sparse units; null past EXACT_LIMIT. */
function etaIntegers(e: number, X: Rational): IntegerGrid | null {
  const v = rat(e, 24);
  const N = toNumber(rfloor(rsub(X, v)));
  const units = etaUnits(e, N);
  // Π Σ|u| bounds every coefficient on the way: refuse before any work when it is too high
  let bound = 1;
  for (const u of units) bound *= sumAbs(u);
  if (bound >= EXACT_LIMIT) return null;
  let acc: IntegerGrid | null = units.length > 0 ? null : { start: rat(0), qDen: 1, rows: N + 1, exactTo: rat(N), zLo: 0, zStep: 1, width: 1, data: Float64Array.from({ length: N + 1 }, (_, n) => (n === 0 ? 1 : 0)) };
  for (const u of units) {
    const g: IntegerGrid = { start: rat(0), qDen: 1, rows: N + 1, exactTo: rat(N), zLo: 0, zStep: 1, width: 1, data: u };
    acc = acc === null ? g : multiplyIntegers(acc, g, rat(N));
    if (acc === null) return null;
  }
  return { ...acc!, start: v, exactTo: X };
}

/** η^e's modular view; valuation e/24. */
export function etaPowerView(e: number): ModularView {
  const v = rat(e, 24);
  return cachedView({
    majorant(X, h): Majorant {
      if (rcmp(X, v) < 0 || e === 0) return rcmp(X, v) < 0 ? zeroMajorant(h) : withOffset(majorantFromLog2(h, 0, [0]), rat(0));
      return etaMajorant(e, X, h);
    },
    residues(X, primes) {
      if (rcmp(X, v) < 0) return zeroResidues(primes, v, 1, X);
      const rows = sliceCountTo(v, 1, X);
      const base = pentagonalResidues(rows, primes);
      const r = e === 1 ? base : powerMillerResidues(base, e, rsub(X, v));
      return { ...r, start: v, exactTo: X };
    },
    power: (k) => etaPowerView(e * k),
    ...(e >= 0 ? { integers: (X: Rational) => (rcmp(X, v) < 0 ? null : etaIntegers(e, X)) } : {}),
    // η^e = q^(e/24)/Π(1 − qⁿ)^(−e): its reciprocal's units
    ...(e < 0 ? { reciprocal: (X: Rational) => (rcmp(X, v) < 0 ? null : etaUnits(-e, toNumber(rfloor(rsub(X, v))))) } : {}),
  });
}
