/** How a verdict's coefficients were computed, in words (terminal and HTML reports). */
import type { Verdict } from '../verdict/index.js';

export function routeText(v: Verdict): string {
  if (v.route === undefined) return 'exact rational arithmetic';
  const k = v.route.primes.length;
  return `residues modulo ${k} prime${k === 1 ? '' : 's'} with height bound 2^${v.route.heightBits} (${v.route.primes.join(', ')})`;
}
