/**
 * φ_{−2,1} = ϑ(τ,z)²/η⁶, the weak Jacobi form of weight −2 and index 1
 * (Eichler–Zagier 1985, Thm 9.3; MATH.md §2). q⁰ slice ζ − 2 + ζ^{−1}.
 */
import { type SeriesSource, productSource, powerSource, cached } from '../series/index.js';
import { thetaSource, etaPowerSource } from './leaves.js';

export function phiMinus2Source(): SeriesSource {
  return cached(productSource([powerSource(thetaSource(1), 2), etaPowerSource(-6)]));
}
