/**
 * `sturmcheck type EXPR`: the inferred type, class, divisors and the bound an
 * identity with this expression as F would need, with its derivation.
 */
import { type Rational, rat } from '../series/index.js';
import type { Expr } from '../lang/ast.js';
import { type ModularType, type FormClass, isConsistent, heisenbergCharacter, formatType } from '../types/index.js';
import type { Monomial } from './atom.js';
import { evaluate, type EvalContext } from './evaluate.js';
import { monomialText, isZeroMonomial } from './monomial.js';
import { splitMonomial, monomialType, monomialClass, quasiReasons } from './monomial-parts.js';
import { numeratorAndDenominator } from './side-zero.js';
import { boundFor } from './bound-of-type.js';

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
  /** Every operator in the expression, innermost first, with its effect on the type. */
  readonly operators: readonly OperatorStep[];
}

export interface OperatorStep {
  /** The operator application as written. */
  readonly text: string;
  readonly input: string;
  readonly output: string;
}

function typeText(m: Monomial, nvars: number): string {
  const t = monomialType(m, nvars);
  const cls = monomialClass(m);
  return t === null ? 'every type (0)' : `${formatType(t)}, ${cls}`;
}

function childExprs(e: Expr): Expr[] {
  switch (e.kind) {
    case 'neg':
      return [e.operand];
    case 'binary':
      return [e.left, e.right];
    case 'power':
      return [e.base];
    case 'substitute':
      return [e.target];
    case 'hecke':
    case 'derivative':
    case 'taylor':
      return [e.arg];
    case 'bracket':
      return [e.left, e.right];
    default:
      return [];
  }
}

function isOperator(e: Expr): boolean {
  return e.kind === 'hecke' || e.kind === 'derivative' || e.kind === 'taylor' || e.kind === 'bracket';
}

/** The operators of an expression, innermost first, each with input and output types. */
export function operatorSteps(e: Expr, ctx: EvalContext): OperatorStep[] {
  const steps = childExprs(e).flatMap((c) => operatorSteps(c, ctx));
  if (isOperator(e)) {
    const nvars = ctx.variables.length;
    const inputs = childExprs(e).map((c) => typeText(evaluate(c, ctx), nvars));
    steps.push({
      text: ctx.text.slice(e.span.startOffset, e.span.endOffset),
      input: inputs.join(' and '),
      output: typeText(evaluate(e, ctx), nvars),
    });
  }
  return steps;
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
    const b = boundFor(t);
    bound = b.qOrder;
    derivation = b.derivation;
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
    operators: operatorSteps(expr, ctx),
  };
}

