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
import { latticeThetaAtom } from './lattice-atom.js';
import {
  etaAtom,
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
  /** The variables of each definition (its parameters, or the file's variables). */
  readonly letVariables: Map<string, readonly string[]>;
  /** Declared lattices: their even Gram matrices. */
  readonly lattices: Map<string, readonly (readonly number[])[]>;
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
    letVariables: new Map(),
    lattices: new Map(),
    letAssumptions: new Map(),
    usedAssumptions: new Set(),
    checkedDivisors: new Set(),
    depth,
  };
}

function textOf(ctx: EvalContext, span: Span): string {
  return ctx.text.slice(span.startOffset, span.endOffset).replace(/\s+/g, ' ').trim();
}

function oneVariable(ctx: EvalContext, span: Span, what: string): void {
  if (ctx.variables.length !== 1) {
    throw evalError(evalCodes.oneVariableOnly, { what, variables: ctx.variables.join(', ') }, span);
  }
}

/** The coefficient vector of a linear form over the variables in scope. */
function linearVector(l: LinearForm, variables: readonly string[]): number[] {
  return variables.map((v) => l.coeffs[v] ?? 0);
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
  const n = ctx.variables.length;
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
      return atom(etaAtom(n));
    case 'delta':
      return deltaMonomial(n);
    case 'eisenstein':
      return atom(eisensteinAtom(e.weight, n));
    case 'jacobiEisenstein':
      oneVariable(ctx, e.span, `E_{${e.weight},1} without arguments`);
      return atom(jacobiEisensteinAtom(e.weight));
    case 'namedForm':
      oneVariable(ctx, e.span, `${e.name} without arguments`);
      return atom(namedFormAtom(e.name));
    case 'theta':
      return thetaMonomial(linearVector(e.arg, ctx.variables));
    case 'wp': {
      const m = wpMonomial(linearVector(e.arg, ctx.variables));
      if (m === null) throw evalError(evalCodes.divisionByZero, { what: 'theta(0)^2, the denominator of wp(0),' }, e.span);
      return m;
    }
    case 'latticeTheta':
      return evaluateLatticeTheta(e.lattice, e.args, e.allZero, e.span, ctx);
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
      if (e.op === 'U') {
        oneVariable(ctx, e.span, `U_${e.level}`);
        return checkDivisors(substituteMonomial(f, [[e.level]], e.span), ctx, e.span);
      }
      return e.op === 'V' ? heckeVMonomial(f, e.level, n, e.span) : heckeTMonomial(f, e.level, n, e.span);
    }
    case 'derivative': {
      const f = evaluate(e.arg, ctx);
      if (e.op === 'Dz') oneVariable(ctx, e.span, 'Dz');
      if (e.op === 'Dq' || e.op === 'Dz') return derivativeMonomial(e.op, f, n, e.span);
      return e.op === 'heat' ? heatMonomial(f, n, e.span) : serreMonomial(f, n, e.span);
    }
    case 'taylor':
      return taylorMonomial(evaluate(e.arg, ctx), e.order, n, e.span);
    case 'bracket':
      return bracketMonomial(evaluate(e.left, ctx), evaluate(e.right, ctx), e.order, n, e.span);
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

/** The variables a substitution target is written in: a definition's own, or one for a built-in. */
function targetVariables(target: Expr, ctx: EvalContext): readonly string[] {
  return target.kind === 'ref' ? (ctx.letVariables.get(target.name) ?? ctx.variables) : ['w'];
}

/** The matrix of w = A·z: a row per target variable, a column per variable in scope. */
function substitutionMatrix(args: readonly LinearForm[], allZero: boolean, arity: number, span: Span, ctx: EvalContext): number[][] {
  if (allZero) return Array.from({ length: arity }, () => ctx.variables.map(() => 0));
  if (args.length !== arity) {
    throw evalError(evalCodes.wrongArity, { expected: arity, found: args.length }, span);
  }
  return args.map((l) => linearVector(l, ctx.variables));
}

function evaluateSubstitution(
  target: Expr,
  args: readonly LinearForm[],
  allZero: boolean,
  span: Span,
  ctx: EvalContext,
): Monomial {
  const vars = targetVariables(target, ctx);
  const A = substitutionMatrix(args, allZero, vars.length, span, ctx);
  const inner = evaluate(target, { ...ctx, variables: vars });
  return checkDivisors(substituteMonomial(inner, A, span), ctx, span);
}

function evaluateLatticeTheta(
  name: string,
  args: readonly LinearForm[],
  allZero: boolean,
  span: Span,
  ctx: EvalContext,
): Monomial {
  const G = ctx.lattices.get(name);
  if (G === undefined) throw evalError(evalCodes.internal, { detail: `unresolved lattice ${name}` }, span);
  const base = atomMonomial(latticeThetaAtom(name, G));
  if (!allZero && args.length === 0) {
    if (ctx.variables.length !== G.length) throw evalError(evalCodes.wrongArity, { expected: G.length, found: ctx.variables.length }, span);
    return base;
  }
  return substituteMonomial(base, substitutionMatrix(args, allZero, G.length, span, ctx), span);
}

/** Evaluates the body of a `let` in its own variables (its parameters, or the file's). */
export function evaluateLetBody(s: Extract<Statement, { kind: 'let' }>, ctx: EvalContext): Monomial {
  const variables = s.params ?? ctx.variables;
  ctx.letVariables.set(s.name, variables);
  return evaluate(s.body, { ...ctx, variables });
}
