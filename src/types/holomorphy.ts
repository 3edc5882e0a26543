/**
 * Holomorphy at the cusp decided by coefficients (MATH.md §6). For one variable and
 * index m the coefficients satisfy c(x + λr + λ²m, r + 2mλ) = ±c(x, r), so every class
 * of r mod 2m has a representative with |r| ≤ m, and the discriminant 4mx − r² is
 * invariant. A weak form is holomorphic iff c(x, r) = 0 whenever 4mx − r² < 0, and a
 * cusp form iff also whenever 4mx − r² = 0; both are decided by the coefficients with
 * |r| ≤ m and x ≤ m/4, since for |r| ≤ m and x > m/4 already 4mx − r² > m² − r² ≥ 0.
 * Weak means no negative q-exponent.
 */
import { type Rational, rat, rmul, rsub, rcmp, rpow } from '../series/index.js';

export type Holomorphy = 'weak' | 'holomorphic' | 'cusp';

/** Whether c(x, r) must vanish for a form with the given property (x, r, m rational). */
export function mustVanish(property: Holomorphy, x: Rational, r: Rational, m: Rational): boolean {
  if (rcmp(x, rat(0)) < 0) return true;
  if (property === 'weak') return false;
  const disc = rsub(rmul(rmul(rat(4), m), x), rpow(r, 2));
  const sign = rcmp(disc, rat(0));
  return property === 'holomorphic' ? sign < 0 : sign <= 0;
}

/** The q-order up to which coefficients decide the property: 0 for weak, m/4 otherwise. */
export function holomorphyOrder(property: Holomorphy, m: Rational): Rational {
  if (property === 'weak') return rat(0);
  const q = rmul(m, rat(1, 4));
  return rcmp(q, rat(0)) > 0 ? q : rat(0);
}
