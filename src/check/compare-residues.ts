/**
 * The comparison of compare-series.ts on the modular route (MATH.md §8). Both sides'
 * majorants give H = D·max(C_L, C_R), D a common denominator; primes avoiding every
 * denominator met, with product M > 2H, are chosen; then D·L and D·R are integers
 * below M/2 in absolute value, so they are equal iff their residues agree modulo every
 * prime, and a residue that differs modulo one prime refutes. The first mismatch (same
 * order as the exact comparison) is reported with exact values recovered by CRT from
 * all the primes — never guessed. A position counts as compared when either side is
 * non-zero, i.e. non-zero modulo some prime.
 */
import {
  type Rational,
  type SeriesSource,
  type ResidueSeries,
  type Majorant,
  type NttPrime,
  type AlignedResidues,

  rat,
  radd,
  rcmp,
  rational,
  lcm,
  heightBitsOf,
  majorantMaxLog2,
  majorantBlockLength,
  rmin,
  choosePrimes,
  modularOf,
  alignResidues,
  garner,
  residueOf,
  mulmod,
  sliceCountTo,
  type Int,
} from '../series/index.js';
import type { ModularRouteRecord } from '../verdict/index.js';
import type { Comparison, Mismatch, ZetaNorm } from './compare-series.js';

export interface ModularSides {
  readonly left: ResidueSeries;
  readonly right: ResidueSeries;
  readonly leftMajorant: Majorant;
  readonly rightMajorant: Majorant;
  readonly den: Int;
  readonly route: ModularRouteRecord;
}

/**
 * Residues of both sides to X with primes enough for both; null when the table is too
 * short or more than `maxPrimes` would be needed.
 */
export function modularSides(ls: SeriesSource, rs: SeriesSource, X: Rational, maxPrimes = Infinity): ModularSides | null {
  const lv = modularOf(ls);
  const rv = modularOf(rs);
  const h = majorantBlockLength(X, rmin(ls.valuation, rs.valuation));
  const ml = lv.majorant(X, h);
  const mr = rv.majorant(X, h);
  const den = lcm(ml.den, mr.den);
  const bits = heightBitsOf(Math.max(majorantMaxLog2(ml), majorantMaxLog2(mr)), den);
  const choice = choosePrimes(bits, lcm(lcm(ml.avoid, mr.avoid), den));
  if (choice === null || choice.primes.length > maxPrimes) return null;
  return {
    left: lv.residues(X, choice.primes),
    right: rv.residues(X, choice.primes),
    leftMajorant: ml,
    rightMajorant: mr,
    den,
    route: { primes: choice.primes.map((p) => p.p), heightBits: bits },
  };
}

/** The exact value at grid entry t of series s (0 left, 1 right), from all residues. */
function exactAt(g: AlignedResidues, s: number, t: number, den: Int): Rational {
  const scaled = g.primes.map((pr: NttPrime, i) => Int32Array.of(mulmod(g.data[s]![i]![t]!, residueOf(den, pr.p), pr.p, 1 / pr.p)));
  return rational(garner(scaled, g.primes, 1)[0]!, den);
}

function nonZeroAt(g: AlignedResidues, s: number, t: number): boolean {
  for (const a of g.data[s]!) if (a[t] !== 0) return true;
  return false;
}

function differsAt(g: AlignedResidues, t: number): boolean {
  for (let i = 0; i < g.primes.length; i++) if (g.data[0]![i]![t] !== g.data[1]![i]![t]) return true;
  return false;
}

/** Compares the sides up to q-order X (≤ their q-order). */
export function compareResiduesTo(sides: ModularSides, X: Rational, norm: ZetaNorm): Comparison {
  const g = alignResidues([sides.left, sides.right]);
  if (rcmp(g.exactTo, X) < 0) throw new RangeError('internal: a side is not known to the q-order compared');
  const rows = Math.min(g.rows, sliceCountTo(g.start, g.qDen, X));
  let compared = 0;
  let mismatch: Mismatch | null = null;
  for (let i = 0; i < rows; i++) {
    let best = -1;
    let bestNorm = 0;
    let bestE = 0;
    for (let j = 0; j < g.width; j++) {
      const t = i * g.width + j;
      if (nonZeroAt(g, 0, t) || nonZeroAt(g, 1, t)) compared++;
      if (mismatch !== null || !differsAt(g, t)) continue;
      const e = g.zLo + g.zStep * j;
      const n = norm([e]);
      if (best < 0 || n < bestNorm || (n === bestNorm && e < bestE)) {
        best = t;
        bestNorm = n;
        bestE = e;
      }
    }
    if (mismatch === null && best >= 0) {
      mismatch = {
        q: radd(g.start, rat(i, g.qDen)),
        zetaHalves: [bestE],
        left: exactAt(g, 0, best, sides.den),
        right: exactAt(g, 1, best, sides.den),
      };
    }
  }
  return { mismatch, compared };
}

