/**
 * Classifies syntax expressions into the `Expr` kinds of ast.ts: calls become
 * operators, built-ins, substitutions or lattice thetas; names become built-in forms
 * or references to earlier lets. Every problem found is reported (not just the
 * first), and the result is null when there was any.
 */
import type { Expr, LinearForm } from './ast.js';
import { builtinNames, lookupBuiltin, type Builtin, type BuiltinForm } from './builtins.js';
import { codes } from './diagnostic-codes.js';
import { diagnostic, type Diagnostic, type DiagnosticTemplate } from './diagnostic.js';
import { toLinearForm } from './linear-form.js';
import type { Scope } from './scope.js';
import type { Span } from './span.js';
import { didYouMean } from './suggest.js';
import type { NameRef, SyntaxExpr } from './syntax-tree.js';

type Call = Extract<SyntaxExpr, { kind: 'call' }>;

interface Substitution {
  readonly args: readonly LinearForm[];
  readonly allZero: boolean;
}

export class ExprResolver {
  readonly diagnostics: Diagnostic[] = [];

  constructor(
    private readonly scope: Scope,
    private readonly text: string,
  ) {}

  resolve(expr: SyntaxExpr): Expr | null {
    switch (expr.kind) {
      case 'number':
        return { kind: 'number', value: expr.value, span: expr.span };
      case 'paren':
        return this.resolve(expr.inner);
      case 'neg': {
        const operand = this.resolve(expr.operand);
        return operand && { kind: 'neg', operand, span: expr.span };
      }
      case 'binary': {
        const left = this.resolve(expr.left);
        const right = this.resolve(expr.right);
        return left && right && { kind: 'binary', op: expr.op, left, right, span: expr.span };
      }
      case 'power': {
        const base = this.resolve(expr.base);
        return base && { kind: 'power', base, exponent: expr.exponent, span: expr.span };
      }
      case 'tau':
        return this.fail(codes.misplacedTau, {}, expr.span);
      case 'scaled':
        return this.fail(
          codes.implicitMultiplication,
          { coefficient: expr.coefficient, name: expr.term?.written ?? 'tau' },
          expr.span,
        );
      case 'name':
        return this.bareName(expr.ref);
      case 'latticeTheta':
        return this.latticeTheta(expr.lattice, null, expr.span);
      case 'call':
        return this.call(expr);
      case 'bracket':
        return this.bracket(expr);
    }
  }

  private bareName(ref: NameRef): Expr | null {
    if (this.scope.variables.includes(ref.name)) return this.fail(codes.variableAsExpression, { name: ref.written }, ref.span);
    const entry = this.scope.lets.get(ref.name);
    if (entry) {
      if (entry.params === null) return { kind: 'ref', name: ref.name, span: ref.span };
      return this.fail(
        codes.parametersNeeded,
        { name: ref.name, parameters: entry.params.join(', '), example: this.exampleCall(ref.name, entry.params.length) },
        ref.span,
      );
    }
    const builtin = lookupBuiltin(ref.parts, ref.name);
    if (builtin === null) return this.notDefined(ref);
    switch (builtin.kind) {
      case 'form':
        return formExpr(builtin.form, ref.span);
      case 'invalid':
        return this.fail(builtin.template, builtin.args, ref.span);
      default:
        return this.fail(codes.missingArguments, { name: ref.name, example: exampleUse(ref.name, builtin) }, ref.span);
    }
  }

  private call(call: Call): Expr | null {
    const callee = call.callee;
    if (callee.kind === 'name') return this.head(callee.ref, call);
    if (callee.kind === 'latticeTheta') return this.latticeTheta(callee.lattice, call.args, call.span);
    if (callee.kind === 'scaled') return this.resolve(callee);
    return this.fail(codes.callOnExpression, {}, call.span);
  }

  /** `NAME(args)`: a built-in operator or form, or a substitution into a let. */
  private head(ref: NameRef, call: Call): Expr | null {
    if (this.scope.variables.includes(ref.name)) return this.fail(codes.notAFunction, { name: ref.written }, ref.span);
    const entry = this.scope.lets.get(ref.name);
    if (entry) {
      const arity = entry.params?.length ?? this.scope.fileVariables.length;
      const target: Expr = { kind: 'ref', name: ref.name, span: ref.span };
      return this.substitute(target, ref.name, arity, call);
    }
    const builtin = lookupBuiltin(ref.parts, ref.name);
    if (builtin === null) return this.notDefined(ref);
    return this.builtinCall(builtin, ref, call);
  }

  private builtinCall(builtin: Builtin, ref: NameRef, call: Call): Expr | null {
    const span = call.span;
    switch (builtin.kind) {
      case 'invalid':
        return this.fail(builtin.template, builtin.args, ref.span);
      case 'form':
        return this.formCall(builtin.form, ref, call);
      case 'ofLinearForm': {
        const [arg] = this.expectArgs(ref.name, call, 1, 'linear form');
        const form = arg && this.linearForm(arg);
        return form ? { kind: builtin.op, arg: form, span } : null;
      }
      case 'derivative': {
        const [arg] = this.expectArgs(ref.name, call, 1, 'argument');
        const resolved = arg && this.resolve(arg);
        return resolved ? { kind: 'derivative', op: builtin.op, arg: resolved, span } : null;
      }
      case 'hecke': {
        const [arg] = this.expectArgs(ref.name, call, 1, 'argument');
        const resolved = arg && this.resolve(arg);
        return resolved ? { kind: 'hecke', op: builtin.op, level: builtin.level, arg: resolved, span } : null;
      }
      case 'taylor':
        return this.taylor(ref, call);
    }
  }

  /** A built-in form with arguments: `(tau)` for the level-one forms, else a substitution. */
  private formCall(form: BuiltinForm, ref: NameRef, call: Call): Expr | null {
    const onlyTau = call.args.length === 1 && call.args[0]!.kind === 'tau';
    const indexZero = form.kind === 'eta' || form.kind === 'delta' || form.kind === 'eisenstein';
    if (onlyTau && indexZero) return formExpr(form, call.span);
    if (form.kind === 'eta') return this.fail(codes.notLevelOne, { name: 'eta' }, call.span);
    if (indexZero && !isZeroLiteral(call)) return this.fail(codes.noSubstitution, { name: ref.name }, call.span);
    return this.substitute(formExpr(form, ref.span), ref.name, indexZero ? 0 : 1, call);
  }

  private substitute(target: Expr, name: string, arity: number, call: Call): Expr | null {
    const substitution = this.substitution(name, arity, call);
    return substitution && { kind: 'substitute', target, ...substitution, span: call.span };
  }

  /** `(0)` sets every variable to 0 whatever the arity; otherwise one linear form per slot. */
  private substitution(name: string, arity: number, call: Call): Substitution | null {
    if (isZeroLiteral(call)) return { args: [], allZero: true };
    if (call.args.length !== arity) {
      this.report(codes.wrongArgumentCount, { name, expected: count(arity, 'linear form'), found: String(call.args.length) }, call.span);
      return null;
    }
    const forms = call.args.map((a) => this.linearForm(a));
    return forms.every((f): f is LinearForm => f !== null) ? { args: forms, allZero: false } : null;
  }

  private latticeTheta(lattice: NameRef, args: readonly SyntaxExpr[] | null, span: Span): Expr | null {
    const entry = this.scope.lattices.get(lattice.name);
    if (!entry) {
      const notes = didYouMean(lattice.name, [...this.scope.lattices.keys()]);
      return this.fail(codes.unknownLattice, { name: lattice.written }, lattice.span, notes);
    }
    const base = { kind: 'latticeTheta' as const, lattice: lattice.name, span };
    if (args === null) return { ...base, args: [], allZero: false };
    const call: Call = { kind: 'call', callee: { kind: 'name', ref: lattice, span: lattice.span }, args, span };
    const substitution = this.substitution(`Theta[${lattice.name}]`, entry.rank, call);
    return substitution && { ...base, ...substitution };
  }

  private taylor(ref: NameRef, call: Call): Expr | null {
    const [arg, order] = this.expectArgs(ref.name, call, 2, 'argument');
    if (!arg || !order) return null;
    const resolved = this.resolve(arg);
    const value = order.kind === 'number' ? Number(order.value) : NaN;
    if (!Number.isSafeInteger(value)) return this.fail(codes.badTaylorOrder, {}, order.span);
    return resolved && { kind: 'taylor', arg: resolved, order: value, span: call.span };
  }

  private bracket(expr: Extract<SyntaxExpr, { kind: 'bracket' }>): Expr | null {
    const left = this.resolve(expr.left);
    const right = this.resolve(expr.right);
    const order = /^[0-9]+$/.test(expr.order) ? Number(expr.order) : NaN;
    if (!Number.isSafeInteger(order)) return this.fail(codes.badBracketOrder, { found: expr.order }, expr.orderSpan);
    return left && right && { kind: 'bracket', left, right, order, span: expr.span };
  }

  /** The arguments of a call with a fixed count, or an empty array after reporting. */
  private expectArgs(name: string, call: Call, n: number, noun: string): readonly (SyntaxExpr | undefined)[] {
    if (call.args.length === n) return call.args;
    this.report(codes.wrongArgumentCount, { name, expected: count(n, noun), found: String(call.args.length) }, call.span);
    return [];
  }

  private linearForm(expr: SyntaxExpr): LinearForm | null {
    const result = toLinearForm(expr, this.scope.variables, (s) => this.text.slice(s.startOffset, s.endOffset));
    if (result.ok) return result.form;
    const variables = this.scope.variables.length > 0 ? this.scope.variables.join(', ') : 'no variables';
    return this.fail(codes.notLinearForm, { variables, reason: result.reason }, result.span);
  }

  private notDefined(ref: NameRef): null {
    const broken = this.scope.brokenLets.get(ref.name);
    if (broken !== undefined) return this.fail(codes.brokenDefinition, { name: ref.name, line: broken }, ref.span);
    const later = this.scope.allLets.get(ref.name);
    if (later !== undefined) return this.fail(codes.usedBeforeDefinition, { name: ref.name, line: later }, ref.span);
    const candidates = [...this.scope.lets.keys(), ...this.scope.variables, ...builtinNames()];
    return this.fail(codes.unknownName, { name: ref.written }, ref.span, didYouMean(ref.name, candidates));
  }

  private exampleCall(name: string, arity: number): string {
    const variable = this.scope.variables[0] ?? 'z';
    return `${name}(${Array.from({ length: arity }, () => variable).join(', ')})`;
  }

  private fail(
    template: DiagnosticTemplate,
    args: Readonly<Record<string, string | number>>,
    span: Span,
    notes?: readonly string[],
  ): null {
    this.report(template, args, span, notes);
    return null;
  }

  private report(
    template: DiagnosticTemplate,
    args: Readonly<Record<string, string | number>>,
    span: Span,
    notes?: readonly string[],
  ): void {
    this.diagnostics.push(diagnostic(template, args, span, notes));
  }
}

function formExpr(form: BuiltinForm, span: Span): Expr {
  return { ...form, span };
}

function isZeroLiteral(call: Call): boolean {
  const only = call.args.length === 1 ? call.args[0] : undefined;
  return only !== undefined && only.kind === 'number' && only.value === '0';
}

function count(n: number, noun: string): string {
  return `${n} ${noun}${n === 1 ? '' : 's'}`;
}

function exampleUse(name: string, builtin: Builtin): string {
  switch (builtin.kind) {
    case 'ofLinearForm':
      return `${name}(z)`;
    case 'taylor':
      return 'taylor(f, 0)';
    default:
      return `${name}(f)`;
  }
}
