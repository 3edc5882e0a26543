/**
 * The normalised Weierstrass function ℘̃ = (2πi)^{−2}℘(τ,z) (MATH.md §2), meromorphic
 * with a double pole at z = 0. It is handled as numerator over denominator ϑ²:
 *   N = ℘̃·ϑ² = (D_ζϑ)² − ϑ·D_ζ²ϑ + (E_2/12)·ϑ²,
 * a holomorphic Jacobi form of weight 3, index 1, multiplier v_η⁶ (the product rule,
 * MATH.md §3). Only N is expanded; the denominator is ϑ(τ,z)² by definition.
 */
import { type SeriesSource, rat, productSource, powerSource, sumSource, cached } from '../series/index.js';
import { thetaSource, eisensteinSource } from './leaves.js';
import { thetaDerivativePairSource } from './theta-derivative-pair.js';

export function wpNumeratorSource(): SeriesSource {
  return cached(
    sumSource([
      { source: thetaDerivativePairSource(), coefficient: rat(1) },
      { source: productSource([eisensteinSource(2), powerSource(thetaSource(1), 2)]), coefficient: rat(1, 12) },
    ]),
  );
}
