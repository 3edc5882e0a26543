/**
 * φ_{−1,2} = ϑ(τ,2z)/η³, the weak Jacobi form of weight −1 and index 2 with character
 * (MATH.md §2; Gritsenko, *Elliptic genus of Calabi–Yau manifolds and Jacobi and Borcherds
 * products*, 1999). q⁰ slice ζ − ζ^{−1}.
 */
import { type SeriesSource, productSource, cached } from '../series/index.js';
import { thetaSource, etaPowerSource } from './leaves.js';

export function phiMinus1Index2Source(): SeriesSource {
  return cached(productSource([thetaSource(2), etaPowerSource(-3)]));
}
