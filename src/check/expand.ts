/**
 * `sturmcheck expand` (CLAIMS.md): the coefficients of an expression up to q^X, with
 * its type and class. A meromorphic expression N/Q is shown as its numerator N and
 * the name of its denominator Q. The default q-order is the leading exponent plus 5.
 */
import {
  type QZSeries,
  type Rational,
  rat,
  radd,
  rcmp,
  leadingExponent,
  truncateSeries,
  zeroSeries,
} from '../series/index.js';
import type { Span } from '../lang/span.js';
import { type FormClass, type ModularType, constantType } from '../types/index.js';
import type { Monomial } from './atom.js';
import { isZeroMonomial, monomialText, ONE_MONOMIAL, multiplyMonomials, powerMonomial, atomMonomial } from './monomial.js';
import { splitMonomial, monomialType, monomialClass, quasiReasons } from './monomial-parts.js';
import { numeratorSource } from './monomial-source.js';
import { estimateTermsForType } from './estimate.js';
import { expandByRoute } from './route-choice.js';
import { zetaNormFor } from './zeta-norm.js';
import type { ZetaNorm } from './compare-series.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

export interface Expansion {
  /** Null for the literal 0, which has every type. */
  readonly type: ModularType | null;
  readonly cls: FormClass;
  readonly quasiReasons: readonly string[];
  /** The denominator Q of a meromorphic expression, as text; null when there is none. */
  readonly denominator: string | null;
  /** The expression (or its numerator N) to qOrder. */
  readonly series: QZSeries;
  readonly qOrder: Rational;
  /** The order of ζ-exponents for output (CLAIMS.md). */
  readonly norm: ZetaNorm;
}

export const DEFAULT_STEPS_PAST_LEADING = 5;

function denominatorMonomial(m: Monomial): Monomial | null {
  const den = splitMonomial(m).denominator;
  if (den.length === 0) return null;
  let q = ONE_MONOMIAL;
  for (const p of den) q = multiplyMonomials(q, powerMonomial(atomMonomial(p.atom), p.exponent));
  return q;
}

export function expandMonomial(m: Monomial, nvars: number, to: Rational | null, maxTerms: number, span: Span | null): Expansion {
  const type = monomialType(m, nvars);
  const cls = monomialClass(m);
  const Q = denominatorMonomial(m);
  const N = Q === null ? m : multiplyMonomials(m, Q);
  const base = { type, cls, quasiReasons: quasiReasons(m), denominator: Q === null ? null : monomialText(Q), norm: zetaNormFor(type) };
  if (isZeroMonomial(m)) {
    const X = to ?? rat(DEFAULT_STEPS_PAST_LEADING);
    return { ...base, series: zeroSeries(X, X), qOrder: X };
  }
  const src = numeratorSource(N);
  const numeratorType = monomialType(N, nvars) ?? constantType(nvars);
  const guard = (X: Rational): number => {
    const estimate = estimateTermsForType(numeratorType, src.valuation, X);
    if (estimate > maxTerms) {
      throw evalError(evalCodes.tooManyTerms, { estimate: Math.ceil(estimate).toExponential(2), limit: maxTerms }, span);
    }
    return estimate;
  };
  if (to !== null) {
    const estimate = guard(to);
    return { ...base, series: truncateSeries(expandByRoute(src, to, nvars, estimate), to), qOrder: to };
  }
  let X = radd(src.valuation, rat(DEFAULT_STEPS_PAST_LEADING));
  guard(X);
  let s = src.expand(X);
  const lead = leadingExponent(s);
  if (lead !== null && rcmp(lead, src.valuation) > 0) {
    X = radd(lead, rat(DEFAULT_STEPS_PAST_LEADING));
    guard(X);
    s = src.expand(X);
  }
  return { ...base, series: truncateSeries(s, X), qOrder: X };
}
