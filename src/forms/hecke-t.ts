/**
 * The Hecke operator T_p on Jacobi forms of index 1, p prime (Eichler–Zagier 1985,
 * Thm 4.5; MATH.md §7). For index 1, c(n, r) depends only on N = 4n − r² (and r mod 2
 * is fixed by N mod 4); writing c(N):
 *   c′(N) = c(p²N) + p^{k−2}·(−N/p)·c(N) + p^{2k−3}·c(N/p²),
 * the last term only when p² | N and N/p² ≡ 0, 3 (mod 4); (−N/p) is the Kronecker
 * symbol. With N_min the least N of the input, the output has N′ ≥ min(N_min,
 * ⌊N_min/p²⌋, p²N_min), so T_p of a weak form may start below q⁰.
 */
import {
  type SeriesSource,
  type QZSeries,
  type Rational,
  rat,
  radd,
  rmul,
  rpow,
  rfloor,
  rcmp,
  rmax,
  rIsZero,
  toNumber,
  isZero,
  mod,
  isqrt,
  rational,
  makeSeries,
  dense,
  slicesFromRationalRows,
  sliceCountTo,
  sliceExponent,
  sliceAtExponent,
  sliceCoefficient,
  zeroSeries,
} from '../series/index.js';
import { kronecker } from './kronecker.js';

/** c(N) of an index-1 form, read at the reduced representative r ∈ {0, 1}. */
function coefficientOfDiscriminant(f: QZSeries, N: number): Rational {
  const r = mod(-N, 4) === 0 ? 0 : mod(-N, 4) === 1 ? 1 : -1;
  if (r < 0) return rat(0);
  const n = rat(N + r * r, 4);
  if (rcmp(n, f.start) < 0) return rat(0);
  if (rcmp(n, f.exactTo) > 0) throw new RangeError('internal: T_p read its input past the q-order it is known to');
  return rational(sliceCoefficient(sliceAtExponent(f, n), 2 * r), f.den);
}

/** The least N = 4n − r² among the non-zero terms. */
function leastDiscriminant(f: QZSeries): number | null {
  let best: number | null = null;
  f.slices.forEach((slice, i) => {
    const n = sliceExponent(f, i);
    const sl = dense(slice);
    sl.c.forEach((v, j) => {
      if (isZero(v)) return;
      const r = (sl.lo + j) / 2;
      const N = toNumber(rmul(n, rat(4)).num) - r * r;
      if (best === null || N < best) best = N;
    });
  });
  return best;
}

export function lowestOutputDiscriminant(nMin: number, p: number): number {
  return Math.min(nMin, Math.floor(nMin / (p * p)), p * p * nMin);
}

export function heckeT(f: QZSeries, k: number, p: number, X: Rational): QZSeries {
  const nMin = leastDiscriminant(f);
  const start = Math.floor(lowestOutputDiscriminant(nMin ?? 0, p) / 4);
  const count = sliceCountTo(rat(start), 1, X);
  if (nMin === null || count === 0) return zeroSeries(X, rat(start));
  const lowN = lowestOutputDiscriminant(nMin, p);
  const c1 = rpow(rat(p), k - 2);
  const c2 = rpow(rat(p), 2 * k - 3);
  const cache = new Map<number, Rational>();
  const cPrime = (N: number): Rational => {
    const hit = cache.get(N);
    if (hit !== undefined) return hit;
    let v = coefficientOfDiscriminant(f, p * p * N);
    const chi = kronecker(-N, p);
    if (chi !== 0) v = radd(v, rmul(rmul(c1, rat(chi)), coefficientOfDiscriminant(f, N)));
    if (N % (p * p) === 0 && [0, 3].includes(mod(N / (p * p), 4))) v = radd(v, rmul(c2, coefficientOfDiscriminant(f, N / (p * p))));
    cache.set(N, v);
    return v;
  };
  const rows: Map<number, Rational>[] = [];
  for (let i = 0; i < count; i++) {
    const n = start + i;
    const row = new Map<number, Rational>();
    const rMax = 4 * n - lowN >= 0 ? isqrt(4 * n - lowN) : -1;
    for (let r = -rMax; r <= rMax; r++) {
      const v = cPrime(4 * n - r * r);
      if (!rIsZero(v)) row.set(2 * r, v);
    }
    rows.push(row);
  }
  const { den, slices } = slicesFromRationalRows(rows);
  return makeSeries(rat(start), 1, den, slices, X, f.nvars);
}

export function heckeTSource(f: SeriesSource, k: number, p: number): SeriesSource {
  const x0 = toNumber(rfloor(f.valuation));
  const start = Math.floor(lowestOutputDiscriminant(4 * x0 - 1, p) / 4);
  return {
    valuation: rat(start),
    expand(X: Rational): QZSeries {
      // c′ at N′ ≤ 4X reads c(p²N′), c(N′), c(N′/p²); c(N) sits at n ≤ (N + 1)/4.
      const need = radd(rmax(rmul(X, rat(p * p)), rmul(X, rat(1, p * p))), rat(1));
      return heckeT(f.expand(rcmp(need, f.valuation) < 0 ? f.valuation : need), k, p, X);
    },
  };
}
