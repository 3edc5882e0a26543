/**
 * The modular differential operators of MATH.md §5 as series sources, in the
 * normalisation D_q = q d/dq, D_ζ = ζ d/dζ (MATH.md §1):
 * - Serre derivative ∂_k f = D_q f − (k/12)·E_2·f : M_k → M_{k+2};
 * - modular heat operator H f = D_q f − (1/4m)·D_ζ² f − ((2k−1)/24)·E_2·f :
 *   J_{k,m} → J_{k+2,m} (one variable, m ≠ 0);
 * - Rankin–Cohen bracket [f,g]_n = Σ_{r+s=n} (−1)^r C(n+k−1, s) C(n+l−1, r) D_q^r f·D_q^s g
 *   (Zagier, *Modular forms and differential operators*, 1994).
 * The E_2 terms cancel the quasi-modularity of D_q, which is why these operators
 * have a type while bare D_q does not.
 */
import {
  type SeriesSource,
  type Rational,
  rat,
  radd,
  rmul,
  rdiv,
  rneg,
  rsub,
  rIsZero,
  mapSource,
  liftQSeries,
  sumSource,
  productSource,
  derivativeQ,
  derivativeZeta,
  type WeightedSource,
} from '../series/index.js';
import { eisensteinSource } from './leaves.js';

/** ∂_k f in a file with n variables (f of index 0, so constant in ζ). */
export function serreSource(f: SeriesSource, k: Rational, n = 1): SeriesSource {
  return sumSource([
    { source: mapSource(f, derivativeQ), coefficient: rat(1) },
    { source: productSource([liftQSeries(eisensteinSource(2), n), f]), coefficient: rneg(rdiv(k, rat(12))) },
  ]);
}

/**
 * The heat operator for an invertible index matrix M of size n (MATH.md §5):
 *   H f = D_q f − ¼ Σ_{ij} (M⁻¹)_{ij} D_{ζ_i}D_{ζ_j} f − ((2k − n)/24)·E_2·f;
 * one variable (n = 1, M⁻¹ = 1/m) is the formula above.
 */
export function heatSource(f: SeriesSource, k: Rational, Minv: readonly (readonly Rational[])[]): SeriesSource {
  const n = Minv.length;
  const terms: WeightedSource[] = [
    { source: mapSource(f, derivativeQ), coefficient: rat(1) },
    { source: productSource([liftQSeries(eisensteinSource(2), n), f]), coefficient: rneg(rdiv(rsub(rmul(rat(2), k), rat(n)), rat(24))) },
  ];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const c = Minv[i]![j]!;
      if (rIsZero(c)) continue;
      terms.push({ source: mapSource(f, (s) => derivativeZeta(derivativeZeta(s, j), i)), coefficient: rneg(rdiv(c, rat(4))) });
    }
  }
  return sumSource(terms);
}

/** The generalised binomial coefficient C(a, b) for rational a and an integer b ≥ 0. */
export function binomial(a: Rational, b: number): Rational {
  let r = rat(1);
  for (let i = 0; i < b; i++) r = rdiv(rmul(r, rsub(a, rat(i))), rat(i + 1));
  return r;
}

function iterate(f: SeriesSource, times: number): SeriesSource {
  let s = f;
  for (let i = 0; i < times; i++) s = mapSource(s, derivativeQ);
  return s;
}

export function rankinCohenSource(f: SeriesSource, k: Rational, g: SeriesSource, l: Rational, n: number): SeriesSource {
  const terms: WeightedSource[] = [];
  for (let r = 0; r <= n; r++) {
    const s = n - r;
    const c = rmul(rmul(binomial(radd(k, rat(n - 1)), s), binomial(radd(l, rat(n - 1)), r)), rat(r % 2 === 0 ? 1 : -1));
    if (!rIsZero(c)) terms.push({ source: productSource([iterate(f, r), iterate(g, s)]), coefficient: c });
  }
  if (terms.length === 0) terms.push({ source: productSource([f, g]), coefficient: rat(0) });
  return sumSource(terms);
}
