/**
 * Whether one side of a claim is identically zero, decided by its own bound (MATH.md
 * §4, item 3): a function of proven type T vanishes iff its coefficients vanish up to
 * the Theorem A bound of T. For N/Q it is N that is tested.
 */
import { rcmp, isZeroSeries, type Rational } from '../series/index.js';
import type { ModularType } from '../types/index.js';
import { boundFor } from './bound-of-type.js';
import type { Monomial } from './atom.js';
import { isZeroMonomial, multiplyMonomials, powerMonomial, atomMonomial, ONE_MONOMIAL } from './monomial.js';
import { splitMonomial, monomialType } from './monomial-parts.js';
import { numeratorSource } from './monomial-source.js';

/** The numerator N of a monomial N/Q (Q its non-unit divisors), and Q. */
export function numeratorAndDenominator(m: Monomial): { N: Monomial; Q: Monomial } {
  let Q = ONE_MONOMIAL;
  for (const p of splitMonomial(m).denominator) Q = multiplyMonomials(Q, powerMonomial(atomMonomial(p.atom), p.exponent));
  return { N: multiplyMonomials(m, Q), Q };
}

/** The q-order to which a function of this type must be compared (Theorem A or B). */
export function boundOfType(t: ModularType): Rational {
  return boundFor(t).qOrder;
}

export function isIdenticallyZero(m: Monomial, nvars: number): boolean {
  if (isZeroMonomial(m)) return true;
  const { N } = numeratorAndDenominator(m);
  const t = monomialType(N, nvars)!;
  const X = boundOfType(t);
  const src = numeratorSource(N);
  if (rcmp(X, src.valuation) < 0) return true;
  return isZeroSeries(src.expand(X));
}
