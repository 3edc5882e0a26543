/**
 * The building blocks as series sources with their valuations (exact ones: each is
 * the q-exponent of a non-zero lowest slice), for precision planning.
 */
import { type SeriesSource, type Rational, rat, source, cached } from '../series/index.js';
import { thetaSeries, THETA_START } from './theta.js';
import { etaPowerSeries } from './eta.js';
import { eisensteinSeries } from './eisenstein.js';
import { etaPowerView } from './eta-residues.js';
import { eisensteinView } from './eisenstein-residues.js';
import { jacobiEisensteinSeries } from './jacobi-eisenstein.js';

/** ϑ(τ, a z); its valuation 1/8 is exact for a ≠ 0 (and ϑ(τ, 0) = 0). */
export function thetaSource(a: number): SeriesSource {
  return cached(source(THETA_START, (X: Rational) => thetaSeries(a, X)));
}

/** η^e, valuation e/24 exactly. */
export function etaPowerSource(e: number): SeriesSource {
  return cached({ ...source(rat(e, 24), (X: Rational) => etaPowerSeries(e, X)), modular: etaPowerView(e) });
}

export function eisensteinSource(k: number): SeriesSource {
  return cached({ ...source(rat(0), (X: Rational) => eisensteinSeries(k, X)), modular: eisensteinView(k) });
}

export function jacobiEisensteinSource(k: number): SeriesSource {
  return cached(source(rat(0), (X: Rational) => jacobiEisensteinSeries(k, X)));
}
