/**
 * Evaluation of a classified expression (lang/ast.ts) to its symbolic form
 * c·Π atom^e (check/atom.ts), with types, classes and series sources attached to
 * the atoms. One variable for now; every failure is an EvalError with a span.
 */
import { rat, rational, intFromString, isSafe, toNumber } from '../series/index.js';
import type { Expr, LinearForm, Statement } from '../lang/ast.js';
import type { Span } from '../lang/span.js';
import type { Atom, Monomial } from './atom.js';
import {
  atomMonomial,
  constantMonomial,
  divideMonomials,
  isZeroMonomial,
  multiplyMonomials,
  powerMonomial,
  scaleMonomial,
} from './monomial.js';
import { splitMonomial } from './monomial-parts.js';
import { sumMonomials } from './sum.js';
import { substituteMonomial } from './substitute-monomial.js';
import { derivativeMonomial } from './derivative-atom.js';
import { serreMonomial, heatMonomial, taylorMonomial, bracketMonomial, heckeVMonomial, heckeTMonomial } from './operator-atom.js';
import { assertDivisorNonZero } from './nonzero.js';
import {
  ETA_ATOM,
  deltaMonomial,
  eisensteinAtom,
  jacobiEisensteinAtom,
  namedFormAtom,
  thetaMonomial,
  wpMonomial,
} from './block-atoms.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

export interface EvalContext {
  /** The source text, to quote terms in messages. */
  readonly text: string;
  readonly variables: readonly string[];
  readonly lets: Map<string, Monomial>;
  /** Definitions whose evaluation failed, with the reason. */
  readonly failedLets: Map<string, string>;
  /** The `assume`d names each definition depends on. */
  readonly letAssumptions: Map<string, ReadonlySet<string>>;
  /** Filled while evaluating: the assumptions the value relies on. */
  readonly usedAssumptions: Set<string>;
  /** Divisors already shown non-zero (by atom key). */
  readonly checkedDivisors: Set<string>;
  /** q-steps past a quasi divisor's nominal bound searched for a non-zero coefficient. */
  readonly depth: number;
}

export function newEvalContext(text: string, variables: readonly string[], depth = 10): EvalContext {
  return {
    text,
    variables,
    lets: new Map(),
    failedLets: new Map(),
    letAssumptions: new Map(),
    usedAssumptions: new Set(),
    checkedDivisors: new Set(),
    depth,
  };
}

function textOf(ctx: EvalContext, span: Span): string {
  return ctx.text.slice(span.startOffset, span.endOffset).replace(/\s+/g, ' ').trim();
}

function oneVariable(ctx: EvalContext, span: Span): void {
  if (ctx.variables.length !== 1) {
    throw evalError(evalCodes.notYetSupported, { what: 'a file with several variables' }, span);
  }
}

/** The integer a of a one-variable linear form a·z (the parser allows only the variables in scope). */
function linearCoefficient(l: LinearForm): number {
  let a = 0;
  for (const c of Object.values(l.coeffs)) a += c;
  return a;
}

function checkDivisors(m: Monomial, ctx: EvalContext, span: Span): Monomial {
  for (const p of splitMonomial(m).denominator) assertDivisorNonZero(p.atom, span, ctx.depth, ctx.checkedDivisors);
  return m;
}

function integerExponent(text: string, span: Span): number {
  const n = intFromString(text);
  if (!isSafe(n) || Math.abs(toNumber(n)) > 1e9) throw evalError(evalCodes.exponentTooLarge, { exponent: text }, span);
  return toNumber(n);
}

function atom(a: Atom): Monomial {
  return atomMonomial(a);
}

export function evaluate(e: Expr, ctx: EvalContext): Monomial {
  oneVariable(ctx, e.span);
  switch (e.kind) {
    case 'number':
      return constantMonomial(rational(intFromString(e.value)));
    case 'neg':
      return scaleMonomial(evaluate(e.operand, ctx), rat(-1));
    case 'binary':
      return evaluateBinary(e.op, e.left, e.right, e.span, ctx);
    case 'power': {
      const base = evaluate(e.base, ctx);
      const k = integerExponent(e.exponent, e.span);
      if (isZeroMonomial(base) && k < 0) throw evalError(evalCodes.zeroToNegativePower, {}, e.span);
      return k < 0 ? checkDivisors(powerMonomial(base, k), ctx, e.span) : powerMonomial(base, k);
    }
    case 'eta':
      return atom(ETA_ATOM);
    case 'delta':
      return deltaMonomial();
    case 'eisenstein':
      return atom(eisensteinAtom(e.weight));
    case 'jacobiEisenstein':
      oneVariable(ctx, e.span);
      return atom(jacobiEisensteinAtom(e.weight));
    case 'namedForm':
      oneVariable(ctx, e.span);
      return atom(namedFormAtom(e.name));
    case 'theta':
      oneVariable(ctx, e.span);
      return thetaMonomial(linearCoefficient(e.arg));
    case 'wp': {
      oneVariable(ctx, e.span);
      const m = wpMonomial(linearCoefficient(e.arg));
      if (m === null) throw evalError(evalCodes.divisionByZero, { what: 'theta(0)^2, the denominator of wp(0),' }, e.span);
      return m;
    }
    case 'latticeTheta':
      throw evalError(evalCodes.notYetSupported, { what: 'the lattice theta series Theta[…]' }, e.span);
    case 'ref': {
      const failed = ctx.failedLets.get(e.name);
      if (failed !== undefined) throw evalError(evalCodes.failedDefinition, { name: e.name, reason: failed }, e.span);
      const v = ctx.lets.get(e.name);
      if (v === undefined) throw evalError(evalCodes.internal, { detail: `unresolved name ${e.name}` }, e.span);
      for (const a of ctx.letAssumptions.get(e.name) ?? []) ctx.usedAssumptions.add(a);
      return v;
    }
    case 'substitute':
      return evaluateSubstitution(e.target, e.args, e.allZero, e.span, ctx);
    case 'hecke': {
      const f = evaluate(e.arg, ctx);
      const n = ctx.variables.length;
      if (e.op === 'U') return checkDivisors(substituteMonomial(f, e.level, e.span), ctx, e.span);
      return e.op === 'V' ? heckeVMonomial(f, e.level, n, e.span) : heckeTMonomial(f, e.level, n, e.span);
    }
    case 'derivative': {
      const f = evaluate(e.arg, ctx);
      const n = ctx.variables.length;
      if (e.op === 'Dq' || e.op === 'Dz') return derivativeMonomial(e.op, f, n, e.span);
      return e.op === 'heat' ? heatMonomial(f, n, e.span) : serreMonomial(f, n, e.span);
    }
    case 'taylor':
      return taylorMonomial(evaluate(e.arg, ctx), e.order, ctx.variables.length, e.span);
    case 'bracket':
      return bracketMonomial(evaluate(e.left, ctx), evaluate(e.right, ctx), e.order, ctx.variables.length, e.span);
  }
}

function evaluateBinary(op: '+' | '-' | '*' | '/', left: Expr, right: Expr, span: Span, ctx: EvalContext): Monomial {
  const l = evaluate(left, ctx);
  const r = evaluate(right, ctx);
  switch (op) {
    case '+':
    case '-':
      return sumMonomials(
        [
          { monomial: l, text: textOf(ctx, left.span) },
          { monomial: op === '+' ? r : scaleMonomial(r, rat(-1)), text: textOf(ctx, right.span) },
        ],
        ctx.variables.length,
        span,
      );
    case '*':
      return multiplyMonomials(l, r);
    case '/':
      if (isZeroMonomial(r)) throw evalError(evalCodes.divisionByZero, { what: `'${textOf(ctx, right.span)}'` }, right.span);
      return checkDivisors(divideMonomials(l, r), ctx, right.span);
  }
}

function evaluateSubstitution(
  target: Expr,
  args: readonly LinearForm[],
  allZero: boolean,
  span: Span,
  ctx: EvalContext,
): Monomial {
  oneVariable(ctx, span);
  if (!allZero && args.length !== 1) {
    throw evalError(evalCodes.notYetSupported, { what: 'substitution of several linear forms' }, span);
  }
  const a = allZero ? 0 : linearCoefficient(args[0]!);
  const m = substituteMonomial(evaluate(target, ctx), a, span);
  return checkDivisors(m, ctx, span);
}

/** Evaluates the body of a `let` (one parameter at most, for now). */
export function evaluateLetBody(s: Extract<Statement, { kind: 'let' }>, ctx: EvalContext): Monomial {
  if (s.params !== null && s.params.length > 1) {
    throw evalError(evalCodes.notYetSupported, { what: 'a definition with several parameters' }, s.span);
  }
  return evaluate(s.body, s.params === null ? ctx : { ...ctx, variables: s.params });
}
