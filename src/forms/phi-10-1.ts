/**
 * φ_{10,1} = Δ·φ_{−2,1} = η¹⁸ϑ², the Jacobi cusp form of weight 10 and index 1
 * (Eichler–Zagier 1985, §3 and Thm 9.3; MATH.md §2).
 */
import { type SeriesSource, productSource, powerSource, cached } from '../series/index.js';
import { thetaSource, etaPowerSource } from './leaves.js';

export function phi10Source(): SeriesSource {
  return cached(productSource([etaPowerSource(18), powerSource(thetaSource(1), 2)]));
}
