/**
 * `sturmcheck type EXPR`: the inferred type, class, divisors and the bound an
 * identity with this expression as F would need, with its derivation.
 */
import { type Rational, rat } from '../series/index.js';
import type { Expr } from '../lang/ast.js';
import { type ModularType, type FormClass, isConsistent, heisenbergCharacter } from '../types/index.js';
import type { Monomial } from './atom.js';
import { evaluate, type EvalContext } from './evaluate.js';
import { monomialText, isZeroMonomial } from './monomial.js';
import { splitMonomial, monomialType, monomialClass, quasiReasons } from './monomial-parts.js';
import { numeratorAndDenominator, boundOfType } from './side-zero.js';
import { boundDerivation } from './check-identity.js';

export interface TypeDescription {
  readonly value: Monomial;
  /** Null for the literal 0 (every type). */
  readonly type: ModularType | null;
  readonly cls: FormClass;
  readonly quasiReasons: readonly string[];
  /** Divisors (non-units with negative exponent), as text. */
  readonly denominators: readonly string[];
  /** Whether a theta quotient was shown holomorphic by the divisor rule. */
  readonly thetaBlock: string | null;
  readonly consistent: boolean;
  readonly heisenberg: readonly number[];
  /** The bound of Theorem A for this type (for N when meromorphic: the type F has after cross-multiplication by Q). */
  readonly bound: Rational | null;
  readonly derivation: string | null;
}

export function describeType(expr: Expr, ctx: EvalContext): TypeDescription {
  const value = evaluate(expr, ctx);
  const nvars = ctx.variables.length;
  const type = monomialType(value, nvars);
  const parts = splitMonomial(value);
  const cls = monomialClass(value);
  let bound: Rational | null = null;
  let derivation: string | null = null;
  if (!isZeroMonomial(value) && type !== null) {
    const t = parts.denominator.length > 0 ? monomialType(numeratorAndDenominator(value).N, nvars)! : type;
    bound = boundOfType(t);
    derivation = boundDerivation(t, bound);
  }
  return {
    value,
    type,
    cls,
    quasiReasons: quasiReasons(value),
    denominators: parts.denominator.map((p) => (p.exponent === 1 ? p.atom.key : `${p.atom.key}^${p.exponent}`)),
    thetaBlock: parts.thetaBlock.length > 0 ? monomialText({ coefficient: rat(1), factors: new Map(parts.thetaBlock.map((p) => [p.atom.key, p])) }) : null,
    consistent: type === null || isConsistent(type),
    heisenberg: type === null ? [] : heisenbergCharacter(type),
    bound,
    derivation,
  };
}

