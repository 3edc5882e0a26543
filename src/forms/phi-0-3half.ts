/**
 * φ_{0,3/2} = ϑ(τ,2z)/ϑ(τ,z) (MATH.md §2), weight 0, index 3/2, Heisenberg character;
 * holomorphic by the divisor rule (the zeros of ϑ(τ,z) are among those of ϑ(τ,2z)),
 * expanded by exact slice division. q⁰ slice ζ^{1/2} + ζ^{−1/2}.
 */
import { type SeriesSource, rat, quotientSource, cached } from '../series/index.js';
import { thetaSource } from './leaves.js';

export function phi0Index3HalfSource(): SeriesSource {
  return cached(
    quotientSource(thetaSource(2), thetaSource(1), rat(1, 8), () => {
      throw new RangeError('internal: ϑ(2z)/ϑ(z) did not divide exactly');
    }),
  );
}
