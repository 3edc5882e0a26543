/**
 * When the checker and `expand` take the modular route by themselves (MATH.md §8), and
 * `expand`'s use of it.
 */
import { type Rational, type QZSeries, type SeriesSource, expandModular } from '../series/index.js';

/**
 * When `auto` takes the modular route: at least MODULAR_MIN_TERMS coefficients in the
 * bound and at most MODULAR_MAX_PRIMES primes for the height. Measured on the family
 * E_4^a·φ_{−2,1}^b == E_4^a·ϑ(z)^{2b}/η^{6b} (2 cores, Node 20): below ~100 coefficients
 * both routes take a few ms; the modular route is about twice as fast up to ~15 primes,
 * even at 27, and slower at 49, where one global height makes every intermediate product
 * use all the primes while the exact engine sizes each product's primes to its own height.
 */
export const MODULAR_MIN_TERMS = 200;
export const MODULAR_MAX_PRIMES = 20;

/** s to q-order X: through residues when one variable and large enough, else exactly. */
export function expandByRoute(s: SeriesSource, X: Rational, nvars: number, estimate: number): QZSeries {
  if (nvars === 1 && estimate >= MODULAR_MIN_TERMS) {
    const m = expandModular(s, X, MODULAR_MAX_PRIMES);
    if (m !== null) return m.series;
  }
  return s.expand(X);
}
