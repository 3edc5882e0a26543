/**
 * φ_{12,1} = Δ·φ_{0,1}, the Jacobi cusp form of weight 12 and index 1
 * (Eichler–Zagier 1985, Thm 9.3; MATH.md §2). q¹ slice ζ + 10 + ζ^{−1}.
 */
import { type SeriesSource, productSource, cached } from '../series/index.js';
import { etaPowerSource } from './leaves.js';
import { phi0Source } from './phi-0-1.js';

export function phi12Source(): SeriesSource {
  return cached(productSource([etaPowerSource(24), phi0Source()]));
}
