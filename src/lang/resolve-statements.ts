/**
 * Walks the statements of a file in order, keeping the scope (variables, lets,
 * lattices), and turns each syntax statement into an AST statement, or drops it with
 * diagnostics. A `let` is visible only after its definition.
 */
import type { Statement, TypeSpec } from './ast.js';
import { isReservedName } from './builtins.js';
import { codes } from './diagnostic-codes.js';
import { diagnostic, type Diagnostic } from './diagnostic.js';
import { ExprResolver } from './resolve-expr.js';
import type { LatticeEntry, LetEntry, Scope } from './scope.js';
import { didYouMean } from './suggest.js';
import type { NameRef, SyntaxRelation, SyntaxStatement } from './syntax-tree.js';
import type { Relation } from './ast.js';

/** One statement of the file: parsed, or already diagnosed (names kept to avoid echoes). */
export type StatementItem =
  | { readonly kind: 'parsed'; readonly statement: SyntaxStatement }
  | { readonly kind: 'broken'; readonly line: number; readonly letName: string | null };

export interface ResolvedStatements {
  readonly statements: readonly Statement[];
  readonly variables: readonly string[];
  readonly diagnostics: readonly Diagnostic[];
}

export const DEFAULT_VARIABLES: readonly string[] = ['z'];

export function resolveStatements(items: readonly StatementItem[], text: string): ResolvedStatements {
  const walker = new StatementWalker(items, text);
  for (const item of items) walker.visit(item);
  return walker.result();
}

class StatementWalker {
  private fileVariables: readonly string[] = DEFAULT_VARIABLES;
  private variablesLine: number | null = null;
  private sawUse = false;
  private readonly lets = new Map<string, LetEntry>();
  private readonly brokenLets = new Map<string, number>();
  private readonly allLets = new Map<string, number>();
  private readonly lattices = new Map<string, LatticeEntry>();
  private readonly statements: Statement[] = [];
  private readonly diagnostics: Diagnostic[] = [];

  constructor(
    items: readonly StatementItem[],
    private readonly text: string,
  ) {
    for (const item of items) {
      const name = item.kind === 'broken' ? item.letName : item.statement.kind === 'let' ? item.statement.name.name : null;
      const line = item.kind === 'broken' ? item.line : item.statement.span.startLine;
      if (name !== null && !this.allLets.has(name)) this.allLets.set(name, line);
    }
  }

  result(): ResolvedStatements {
    return { statements: this.statements, variables: this.fileVariables, diagnostics: this.diagnostics };
  }

  visit(item: StatementItem): void {
    if (item.kind === 'broken') {
      this.sawUse ||= item.letName !== null;
      if (item.letName !== null && !this.lets.has(item.letName)) this.brokenLets.set(item.letName, item.line);
      return;
    }
    const before = this.diagnostics.length;
    const statement = this.statement(item.statement);
    if (statement !== null && this.diagnostics.length === before) this.statements.push(statement);
  }

  private statement(s: SyntaxStatement): Statement | null {
    switch (s.kind) {
      case 'variables':
        return this.variables(s);
      case 'lattice':
        return this.lattice(s);
      case 'let':
        this.sawUse = true;
        return this.let(s);
      case 'assume':
        this.sawUse = true;
        return this.assume(s);
      case 'claim': {
        this.sawUse = true;
        const relation = this.relation(s.relation);
        return relation && { kind: 'claim', name: s.name, expect: s.expect, relation, span: s.span };
      }
    }
  }

  private variables(s: Extract<SyntaxStatement, { kind: 'variables' }>): Statement | null {
    if (this.variablesLine !== null) return this.fail(codes.variablesTwice, { line: this.variablesLine }, s);
    if (this.sawUse) return this.fail(codes.lateVariables, {}, s);
    if (!this.checkNewNames(s.names)) return null;
    this.variablesLine = s.span.startLine;
    this.fileVariables = s.names.map((n) => n.name);
    return { kind: 'variables', names: this.fileVariables, span: s.span };
  }

  private lattice(s: Extract<SyntaxStatement, { kind: 'lattice' }>): Statement | null {
    const previous = this.lattices.get(s.name.name);
    if (previous) return this.fail(codes.redefinition, { name: s.name.name, line: previous.line }, s.name);
    this.lattices.set(s.name.name, { rank: s.gram.rows.length, line: s.span.startLine });
    return { kind: 'lattice', name: s.name.name, gram: s.gram, span: s.span };
  }

  private let(s: Extract<SyntaxStatement, { kind: 'let' }>): Statement | null {
    const name = s.name.name;
    const namesOk = this.checkLetName(s.name) && (s.params === null || this.checkNewNames(s.params));
    const params = s.params?.map((p) => p.name) ?? null;
    const resolver = this.resolver(params ?? this.fileVariables);
    const body = resolver.resolve(s.body);
    this.diagnostics.push(...resolver.diagnostics);
    if (!namesOk) return null;
    if (body === null) {
      this.brokenLets.set(name, s.span.startLine);
      return null;
    }
    this.lets.set(name, { params, line: s.span.startLine });
    return { kind: 'let', name, params, body, span: s.span };
  }

  private assume(s: Extract<SyntaxStatement, { kind: 'assume' }>): Statement | null {
    const typeOk = this.checkType(s.type);
    const name = s.name.name;
    if (!this.lets.has(name)) {
      const broken = this.brokenLets.get(name);
      if (broken !== undefined) return this.fail(codes.brokenDefinition, { name, line: broken }, s.name);
      const later = this.allLets.get(name);
      if (later !== undefined) return this.fail(codes.usedBeforeDefinition, { name, line: later }, s.name);
      return this.fail(codes.assumeNeedsLet, { name: s.name.written }, s.name, didYouMean(name, [...this.lets.keys()]));
    }
    return typeOk ? { kind: 'assume', name, type: s.type, span: s.span } : null;
  }

  private relation(r: SyntaxRelation): Relation | null {
    const resolver = this.resolver(this.fileVariables);
    if (r.kind === 'identity') {
      const left = resolver.resolve(r.left);
      const right = resolver.resolve(r.right);
      this.diagnostics.push(...resolver.diagnostics);
      return left && right && { kind: 'identity', left, right, span: r.span };
    }
    const expr = resolver.resolve(r.expr);
    this.diagnostics.push(...resolver.diagnostics);
    const typeOk = this.checkType(r.type);
    return expr && typeOk ? { kind: 'typeAssertion', expr, type: r.type, span: r.span } : null;
  }

  private checkType(type: TypeSpec): boolean {
    if (type.index.kind !== 'latticeName' || this.lattices.has(type.index.name)) return true;
    const notes = didYouMean(type.index.name, [...this.lattices.keys()]);
    this.diagnostics.push(diagnostic(codes.unknownLattice, { name: type.index.name }, type.index.span, notes));
    return false;
  }

  private checkLetName(ref: NameRef): boolean {
    const name = ref.name;
    const previous = this.lets.get(name)?.line ?? this.brokenLets.get(name);
    if (previous !== undefined) return this.report(codes.redefinition, { name, line: previous }, ref);
    if (this.fileVariables.includes(name)) return this.report(codes.clashWithVariable, { name, use: 'defined with let' }, ref);
    if (isReservedName(ref.parts, name)) return this.report(codes.builtinRedefinition, { name }, ref);
    return true;
  }

  /** Variables and parameters: not built-in, not repeated. */
  private checkNewNames(names: readonly NameRef[]): boolean {
    let ok = true;
    names.forEach((ref, i) => {
      if (isReservedName(ref.parts, ref.name)) ok = this.report(codes.builtinRedefinition, { name: ref.name }, ref);
      else if (names.slice(0, i).some((other) => other.name === ref.name)) {
        ok = this.report(codes.duplicateName, { name: ref.name }, ref);
      }
    });
    return ok;
  }

  private resolver(variables: readonly string[]): ExprResolver {
    const scope: Scope = {
      variables,
      fileVariables: this.fileVariables,
      lets: this.lets,
      brokenLets: this.brokenLets,
      allLets: this.allLets,
      lattices: this.lattices,
    };
    return new ExprResolver(scope, this.text);
  }

  private report(
    template: Parameters<typeof diagnostic>[0],
    args: Readonly<Record<string, string | number>>,
    at: { readonly span: Diagnostic['span'] },
    notes?: readonly string[],
  ): false {
    this.diagnostics.push(diagnostic(template, args, at.span, notes));
    return false;
  }

  private fail(
    template: Parameters<typeof diagnostic>[0],
    args: Readonly<Record<string, string | number>>,
    at: { readonly span: Diagnostic['span'] },
    notes?: readonly string[],
  ): null {
    this.report(template, args, at, notes);
    return null;
  }
}
