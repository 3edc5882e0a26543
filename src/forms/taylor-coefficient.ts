/**
 * Modified Taylor coefficients (MATH.md §5, "automorphic correction"; Eichler–Zagier
 * 1985, §3): for f of weight k and index m, expand exp(−(m/12)·E_2·w²)·f(τ, w/2πi) =
 * Σ_ν g_ν(τ) w^ν; then g_ν ∈ M_{k+ν} with f's multiplier. With
 * χ_μ = Σ c(x, r)·r^μ/μ!·q^x,
 *   g_ν = Σ_{j ≥ 0} (−m·E_2/12)^j / j! · χ_{ν−2j}.
 */
import {
  type SeriesSource,
  type QZSeries,
  type Rational,
  type Int,
  JSBI,
  ZERO,
  int,
  rat,

  rdiv,
  rneg,
  rpow,
  rIsZero,
  mapSource,
  sumSource,
  productSource,
  powerSource,
  makeSeries,
  dense,
  trimSlice,
  type WeightedSource,
} from '../series/index.js';
import { eisensteinSource } from './leaves.js';

function factorial(n: number): Int {
  let r = int(1);
  for (let i = 2; i <= n; i++) r = JSBI.multiply(r, int(i));
  return r;
}

/** χ_μ: the ζ-moment Σ_r c(x, r) r^μ / μ! of every slice, as a q-series. */
export function zetaMoment(s: QZSeries, mu: number): QZSeries {
  const slices = s.slices.map((slice) => {
    const sl = dense(slice);
    let t = ZERO;
    sl.c.forEach((v, k) => {
      if (!JSBI.equal(v, ZERO)) t = JSBI.add(t, JSBI.multiply(v, JSBI.exponentiate(int(sl.lo + k), int(mu))));
    });
    return trimSlice(0, [t]);
  });
  // ζ-exponents are stored in halves: r^μ = (e/2)^μ.
  const den = JSBI.multiply(JSBI.multiply(s.den, JSBI.exponentiate(int(2), int(mu))), factorial(mu));
  return makeSeries(s.start, s.qDen, den, slices, s.exactTo, s.nvars);
}

export function taylorSource(f: SeriesSource, m: Rational, nu: number): SeriesSource {
  const terms: WeightedSource[] = [];
  for (let j = 0; 2 * j <= nu; j++) {
    const coefficient = rdiv(rpow(rneg(rdiv(m, rat(12))), j), rat(Number(factorial(j).toString())));
    if (rIsZero(coefficient) && j > 0) continue;
    const chi = mapSource(f, (s) => zetaMoment(s, nu - 2 * j));
    terms.push({ source: j === 0 ? chi : productSource([powerSource(eisensteinSource(2), j), chi]), coefficient });
  }
  return sumSource(terms);
}

