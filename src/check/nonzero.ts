/**
 * Every non-unit divisor must be shown non-zero before it is used (MATH.md §3): a
 * non-zero coefficient proves it. A divisor of proven type (class modular) whose
 * coefficients all vanish up to its own Theorem A bound is identically zero — a
 * division by zero. A quasi-modular divisor with no non-zero coefficient within its
 * nominal bound plus `depth` q-steps cannot be shown non-zero.
 */
import { rat, radd, rmax, rcmp, isZeroSeries, rationalToString, type Rational, powerText } from '../series/index.js';
import type { Span } from '../lang/span.js';
import { scalarIndexOf } from '../types/index.js';
import { theoremABound } from '../bound/index.js';
import type { Atom } from './atom.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

export function assertDivisorNonZero(atom: Atom, span: Span | null, depth: number, checked: Set<string>): void {
  if (atom.kind !== 'other' || atom.valuationExact || checked.has(atom.key)) return;
  const bound = theoremABound(atom.type.weight, scalarIndexOf(atom.type));
  const proven = atom.cls === 'modular';
  const X: Rational = proven ? bound : radd(rmax(bound, rat(0)), rat(depth));
  if (rcmp(X, atom.source.valuation) < 0) {
    if (proven) throw evalError(evalCodes.divisionByZero, { what: atom.key }, span, [`its type forces it to vanish (bound ${powerText('q', X, false)} is below its lowest exponent)`]);
  } else if (!isZeroSeries(atom.source.expand(X))) {
    checked.add(atom.key);
    return;
  }
  if (proven) {
    throw evalError(evalCodes.divisionByZero, { what: atom.key }, span, [
      `all its coefficients up to ${powerText('q', X, false)} vanish, and that is its Theorem A bound`,
    ]);
  }
  throw evalError(evalCodes.divisorNotShownNonZero, { what: atom.key, order: rationalToString(X) }, span);
}
