/**
 * φ_{0,1} = 12((D_ζϑ)² − ϑ·D_ζ²ϑ)/η⁶ + E_2·ϑ²/η⁶ (MATH.md §2), the weak Jacobi form of
 * weight 0 and index 1 (Eichler–Zagier 1985, Thm 9.3). Written with E_2 and D_ζ, yet
 * not quasi-modular: 12℘̃·φ_{−2,1} with ℘̃ the normalised Weierstrass function.
 * q⁰ slice ζ + 10 + ζ^{−1}.
 */
import { type SeriesSource, rat, productSource, powerSource, sumSource, cached } from '../series/index.js';
import { thetaSource, etaPowerSource, eisensteinSource } from './leaves.js';
import { thetaDerivativePairSource } from './theta-derivative-pair.js';

export function phi0Source(): SeriesSource {
  const numerator = sumSource([
    { source: thetaDerivativePairSource(), coefficient: rat(12) },
    { source: productSource([eisensteinSource(2), powerSource(thetaSource(1), 2)]), coefficient: rat(1) },
  ]);
  return cached(productSource([numerator, etaPowerSource(-6)]));
}
