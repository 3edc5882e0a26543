/**
 * Products and powers of integer grids (integer-grid.ts), exact or refused. A product
 * is formed only when max|a|·Σ|b| (or Σ|a|·max|b|) is below EXACT_LIMIT: every partial
 * sum of a coefficient of ab is a sum of distinct products a_i·b_j, one per i and one per
 * j, so it stays below that bound and no double rounds. Short or sparse factors take the
 * sparse path in doubles; long dense ones go through residues modulo two primes (their
 * product exceeds 2·2^53) and CRT, whichever the operation count says is cheaper.
 */
import { type Rational, rmul, rat, rsub, rcmp } from '../rational.js';
import { nttPrime, type NttPrime } from '../modular/ntt-primes.js';
import { invmod, mulmod } from '../modular/mulmod.js';
import { regridOf, regridInto } from './residue-series.js';
import { type IntegerGrid, EXACT_LIMIT, truncateIntegers, trimIntegerColumns, residuesOfIntegers } from './integer-grid.js';
import { maxAbs, sumAbs, sparseDenseIntegers } from './shared-integers.js';
import { productShape, sparseWork, transformCost, multiplyResidues } from './residue-multiply.js';

function regridIntegers(g: IntegerGrid, qDen: number, zStep: number, width: number): IntegerGrid {
  if (qDen === g.qDen && zStep === g.zStep && width === g.width) return g;
  const m = regridOf(g, qDen, zStep, g.zLo);
  return { ...g, qDen, rows: m.rows, zStep, width, data: regridInto(g.data, g, m, new Float64Array(m.rows * width), width) };
}

/** Two primes whose product exceeds 2·(2^52 + 2^29): CRT then recovers any integer below EXACT_LIMIT. */
function twoPrimes(): readonly [NttPrime, NttPrime] {
  return [nttPrime(0)!, nttPrime(1)!];
}

/**
 * v with v ≡ r1 (mod p1), v ≡ r2 (mod p2), from symmetric digits: v = s1 + p1·m with
 * |s1| < p1/2 and |m| ≤ p2/2. The caller promises |v| < EXACT_LIMIT, so p1·m = v − s1 stays
 * below 2^53 and every step is exact in doubles.
 */
function crtTwo(r1: Int32Array, r2: Int32Array, p1: number, p2: number): Float64Array {
  const inv = invmod(p1 % p2, p2);
  const pinv2 = 1 / p2;
  const out = new Float64Array(r1.length);
  for (let t = 0; t < r1.length; t++) {
    const a = r1[t]!;
    const s1 = a > p1 >> 1 ? a - p1 : a;
    let d = (r2[t]! - s1) % p2;
    if (d < 0) d += p2;
    const m = mulmod(d, inv, p2, pinv2);
    out[t] = s1 + p1 * (m > p2 >> 1 ? m - p2 : m);
  }
  return out;
}

/** a·b to q-order X (or less, where a factor is not known far enough); null if a partial sum could reach EXACT_LIMIT. */
export function multiplyIntegers(x: IntegerGrid, y: IntegerGrid, X: Rational): IntegerGrid | null {
  return multiplyIntegersBy(null, x, y, X);
}

export type IntegerProductRoute = 'sparse' | 'two-primes';

/** a·b by a given route (tests compare them); null lets the operation count choose. */
export function multiplyIntegersBy(forced: IntegerProductRoute | null, x: IntegerGrid, y: IntegerGrid, X: Rational): IntegerGrid | null {
  if (Math.min(maxAbs(x.data) * sumAbs(y.data), sumAbs(x.data) * maxAbs(y.data)) >= EXACT_LIMIT) return null;
  const sh = productShape(x, y, X);
  const a = regridIntegers(x, sh.qDen, sh.zStep, sh.wa);
  const b = regridIntegers(y, sh.qDen, sh.zStep, sh.wb);
  const { rows, width } = sh;
  const shape = { start: sh.start, qDen: sh.qDen, rows, exactTo: sh.exactTo, zLo: a.zLo + b.zLo, zStep: sh.zStep, width };
  const ra = Math.min(rows, a.rows);
  const rb = Math.min(rows, b.rows);
  const workA = sparseWork(a.data, a.width, rb, b.width, rows);
  const workB = sparseWork(b.data, b.width, ra, a.width, rows);
  const transform = transformCost(ra, rb, a.width, b.width, width);
  const route = forced ?? (transform !== null && 2 * transform.cost < Math.min(workA, workB) ? 'two-primes' : 'sparse');
  if (route === 'two-primes') {
    const primes = twoPrimes();
    const { primes: _, data, ...product } = multiplyResidues(residuesOfIntegers(a, primes), residuesOfIntegers(b, primes), sh.exactTo);
    return { ...product, data: crtTwo(data[0]!, data[1]!, primes[0].p, primes[1].p) };
  }
  const data = workA <= workB ? sparseDenseIntegers(a.data, a.width, b.data, b.width, rows, width) : sparseDenseIntegers(b.data, b.width, a.data, a.width, rows, width);
  return trimIntegerColumns({ ...shape, data });
}

/**
 * f^k (k ≥ 1) to q-order X by k − 1 products, f known to X − (k − 1)·v(f). Refused at
 * once, before any work, when max|f|·(Σ|f|)^(k−1) — a bound of every product on the
 * way — reaches the limit; the products check themselves all the same.
 */
export function powerIntegers(f: IntegerGrid, k: number, X: Rational): IntegerGrid | null {
  let bound = maxAbs(f.data);
  const s = sumAbs(f.data);
  for (let i = 1; i < k && bound < EXACT_LIMIT; i++) bound *= s;
  if (bound >= EXACT_LIMIT) return null;
  let acc: IntegerGrid = f;
  for (let i = 2; i <= k; i++) {
    // f^i is needed to X − (k − i)·v(f); the grid's start bounds v(f) from below
    const next = multiplyIntegers(acc, f, rsub(X, rmul(f.start, rat(k - i))));
    if (next === null) return null;
    acc = next;
  }
  return rcmp(acc.exactTo, X) > 0 ? truncateIntegers(acc, X) : acc;
}
