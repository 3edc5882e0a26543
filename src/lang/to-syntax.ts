/**
 * CST → syntax tree, with source spans. Runs only on statements that parsed without
 * error, so every child the grammar requires is present. Checks that need values
 * rather than shapes (integer exponents, rational literals, square symmetric
 * matrices, `character eta^D`) happen here and add diagnostics.
 */
import type { CstNode, IToken } from 'chevrotain';
import type { Expectation, IndexSpec, MatrixLiteral, TypeSpec } from './ast.js';
import type * as Cst from './cst-types.js';
import { codes } from './diagnostic-codes.js';
import { diagnostic, type Diagnostic, type DiagnosticTemplate } from './diagnostic.js';
import { integerExponent } from './integer-exponent.js';
import { readName, readSubscript } from './names.js';
import { reduceRational } from './rational-literal.js';
import type { Span } from './span.js';
import { joinSpans, tokenSpan } from './span-of.js';
import type { NameRef, SyntaxExpr, SyntaxRelation, SyntaxStatement } from './syntax-tree.js';

/** A required CST child is missing: only possible if the grammar and this file disagree. */
export class MissingChildError extends Error {}

function only<T>(children: readonly T[] | undefined, what: string): T {
  const child = children?.[0];
  if (child === undefined) throw new MissingChildError(`missing ${what}`);
  return child;
}

function byOffset(a: IToken, b: IToken): number {
  return a.startOffset - b.startOffset;
}

export class CstConverter {
  readonly diagnostics: Diagnostic[] = [];

  constructor(
    private readonly text: string,
    private readonly file: string,
  ) {}

  statement(node: Cst.StatementCstNode): SyntaxStatement {
    const c = node.children;
    if (c.variablesStatement) return this.variables(only(c.variablesStatement, 'variables'));
    if (c.latticeStatement) return this.lattice(only(c.latticeStatement, 'lattice'));
    if (c.letStatement) return this.let(only(c.letStatement, 'let'));
    if (c.assumeStatement) return this.assume(only(c.assumeStatement, 'assume'));
    return this.claim(only(c.claimStatement, 'claim'));
  }

  expression(node: Cst.ExpressionCstNode): SyntaxExpr {
    const operands = node.children.product.map((p) => this.product(p));
    const operators = [...(node.children.Plus ?? []), ...(node.children.Minus ?? [])].sort(byOffset);
    return this.foldLeft(operands, operators, (t) => (t.image === '+' ? '+' : '-'));
  }

  private variables(node: Cst.VariablesStatementCstNode): SyntaxStatement {
    return { kind: 'variables', names: node.children.Name.map((t) => this.nameRef(t)), span: this.nodeSpan(node) };
  }

  private lattice(node: Cst.LatticeStatementCstNode): SyntaxStatement {
    const c = node.children;
    return {
      kind: 'lattice',
      name: this.nameRef(only(c.Name, 'lattice name')),
      gram: this.matrix(only(c.matrix, 'matrix')),
      span: this.nodeSpan(node),
    };
  }

  private let(node: Cst.LetStatementCstNode): SyntaxStatement {
    const c = node.children;
    const parameters = c.parameterList?.[0];
    return {
      kind: 'let',
      name: this.nameRef(only(c.Name, 'let name')),
      params: parameters ? parameters.children.Name.map((t) => this.nameRef(t)) : null,
      body: this.expression(only(c.expression, 'let body')),
      span: this.nodeSpan(node),
    };
  }

  private assume(node: Cst.AssumeStatementCstNode): SyntaxStatement {
    const c = node.children;
    return {
      kind: 'assume',
      name: this.nameRef(only(c.Name, 'assumed name')),
      type: this.typeSpec(only(c.typeSpec, 'type')),
      span: this.nodeSpan(node),
    };
  }

  private claim(node: Cst.ClaimStatementCstNode): SyntaxStatement {
    const c = node.children;
    const label = c.StringLiteral?.[0];
    const expectation = c.expectation?.[0];
    return {
      kind: 'claim',
      name: label ? this.stringValue(label) : null,
      expect: expectation ? this.expectation(expectation) : null,
      relation: this.relation(only(c.relation, 'relation')),
      span: this.nodeSpan(node),
    };
  }

  private stringValue(token: IToken): string {
    // The token's pattern admits only valid JSON strings.
    const value: unknown = JSON.parse(token.image);
    return typeof value === 'string' ? value : token.image;
  }

  private expectation(node: Cst.ExpectationCstNode): Expectation {
    const c = node.children;
    return c.Proved ? 'proved' : c.Refuted ? 'refuted' : 'unproved';
  }

  private relation(node: Cst.RelationCstNode): SyntaxRelation {
    const c = node.children;
    const left = this.expression(only(c.expression, 'left side'));
    const span = this.nodeSpan(node);
    if (c.EqualEqual) return { kind: 'identity', left, right: this.expression(c.expression[1]!), span };
    return { kind: 'typeAssertion', expr: left, type: this.typeSpec(only(c.typeSpec, 'type')), span };
  }

  private typeSpec(node: Cst.TypeSpecCstNode): TypeSpec {
    const c = node.children;
    const qualifier = c.qualifier?.[0]?.children;
    const character = c.characterSpec?.[0];
    return {
      weight: this.rational(only(c.rational, 'weight')),
      index: this.indexSpec(only(c.indexSpec, 'index')),
      character: character ? this.character(character) : null,
      qualifier: qualifier ? (qualifier.Weak ? 'weak' : qualifier.Holomorphic ? 'holomorphic' : 'cusp') : null,
      span: this.nodeSpan(node),
    };
  }

  private indexSpec(node: Cst.IndexSpecCstNode): IndexSpec {
    const c = node.children;
    const rational = c.rational?.[0];
    if (rational) return { kind: 'scalar', value: this.rational(rational), span: this.nodeSpan(rational) };
    const matrix = c.matrix?.[0];
    if (matrix) return { kind: 'matrix', matrix: this.matrix(matrix) };
    const lattice = only(c.latticeSpec, 'lattice').children;
    const gram = lattice.matrix?.[0];
    if (gram) return { kind: 'latticeMatrix', gram: this.matrix(gram) };
    const name = this.nameRef(only(lattice.Name, 'lattice name'));
    return { kind: 'latticeName', name: name.name, span: name.span };
  }

  /** `character eta^D` → D; a bare `character eta` means D = 1. */
  private character(node: Cst.CharacterSpecCstNode): number {
    const c = node.children;
    const name = this.nameRef(only(c.Name, 'eta'));
    if (name.name !== 'eta') this.report(codes.characterNotEta, { found: name.written }, name.span);
    const exponent = c.exponent?.[0];
    if (!exponent) return 1;
    const value = BigInt(this.exponentValue(exponent));
    // Only D mod 24 matters; reducing keeps a huge D representable as a number.
    return Number.isSafeInteger(Number(value)) ? Number(value) : Number(value % 24n);
  }

  private matrix(node: Cst.MatrixCstNode): MatrixLiteral {
    const rows = node.children.matrixRow.map((row) => row.children.rational.map((r) => this.rational(r)));
    const span = this.nodeSpan(node);
    const problem = matrixShapeProblem(rows);
    if (problem) this.report(codes.matrixShape, { reason: problem }, span);
    return { rows, span };
  }

  private rational(node: Cst.RationalCstNode): string {
    const c = node.children;
    const denominator = c.Integer[1]?.image ?? null;
    const reduced = reduceRational(c.Minus !== undefined, only(c.Integer, 'integer').image, denominator);
    if (reduced.ok) return reduced.text;
    const span = this.nodeSpan(node);
    this.report(codes.zeroDenominator, { text: this.source(span) }, span);
    return '0';
  }

  private product(node: Cst.ProductCstNode): SyntaxExpr {
    const operands = node.children.unary.map((u) => this.unary(u));
    const operators = [...(node.children.Star ?? []), ...(node.children.Slash ?? [])].sort(byOffset);
    return this.foldLeft(operands, operators, (t) => (t.image === '/' ? '/' : '*'));
  }

  private foldLeft(
    operands: readonly SyntaxExpr[],
    operators: readonly IToken[],
    opOf: (t: IToken) => '+' | '-' | '*' | '/',
  ): SyntaxExpr {
    let result = operands[0]!;
    operators.forEach((operator, i) => {
      const right = operands[i + 1]!;
      result = { kind: 'binary', op: opOf(operator), left: result, right, span: joinSpans(result.span, right.span) };
    });
    return result;
  }

  private unary(node: Cst.UnaryCstNode): SyntaxExpr {
    const c = node.children;
    const minus = c.Minus?.[0];
    if (!minus) return this.power(only(c.power, 'power'));
    const operand = this.unary(only(c.unary, 'operand'));
    return { kind: 'neg', operand, span: joinSpans(tokenSpan(minus, this.file), operand.span) };
  }

  private power(node: Cst.PowerCstNode): SyntaxExpr {
    const c = node.children;
    const base = this.postfix(only(c.postfix, 'base'));
    const exponent = c.exponent?.[0];
    if (!exponent) return base;
    return { kind: 'power', base, exponent: this.exponentValue(exponent), span: this.nodeSpan(node) };
  }

  /** The exponent as a signed decimal integer; a diagnostic (and `0`) when it is not one. */
  private exponentValue(node: Cst.ExponentCstNode): string {
    const expr = this.exponent(node);
    const value = integerExponent(expr);
    if (value.ok) return value.value.toString();
    if (value.reason === 'tooLarge') this.report(codes.exponentTooLarge, {}, value.at.span);
    else this.report(codes.nonIntegerExponent, { found: `'${this.source(expr.span)}'` }, expr.span);
    return '0';
  }

  private exponent(node: Cst.ExponentCstNode): SyntaxExpr {
    const c = node.children;
    const minus = c.Minus?.[0];
    if (minus) {
      const operand = this.exponent(only(c.exponent, 'exponent'));
      return { kind: 'neg', operand, span: joinSpans(tokenSpan(minus, this.file), operand.span) };
    }
    const braced = c.expression?.[0];
    if (braced) return { kind: 'paren', inner: this.expression(braced), span: this.nodeSpan(node) };
    return this.power(only(c.power, 'power'));
  }

  private postfix(node: Cst.PostfixCstNode): SyntaxExpr {
    let result = this.primary(only(node.children.primary, 'primary'));
    for (const call of node.children.callArguments ?? []) {
      const args = (call.children.expression ?? []).map((e) => this.expression(e));
      result = { kind: 'call', callee: result, args, span: joinSpans(result.span, this.nodeSpan(call)) };
    }
    return result;
  }

  private primary(node: Cst.PrimaryCstNode): SyntaxExpr {
    const c = node.children;
    if (c.numberTerm) return this.numberTerm(only(c.numberTerm, 'number'));
    if (c.Name) {
      const ref = this.nameRef(only(c.Name, 'name'));
      return { kind: 'name', ref, span: ref.span };
    }
    if (c.Tau) return { kind: 'tau', span: tokenSpan(only(c.Tau, 'tau'), this.file) };
    if (c.parenthesized) {
      const group = only(c.parenthesized, 'parentheses');
      return {
        kind: 'paren',
        inner: this.expression(only(group.children.expression, 'expression')),
        span: this.nodeSpan(group),
      };
    }
    if (c.latticeTheta) {
      const theta = only(c.latticeTheta, 'Theta');
      return {
        kind: 'latticeTheta',
        lattice: this.nameRef(only(theta.children.Name, 'lattice')),
        span: this.nodeSpan(theta),
      };
    }
    return this.rankinCohen(only(c.rankinCohen, 'bracket'));
  }

  private numberTerm(node: Cst.NumberTermCstNode): SyntaxExpr {
    const c = node.children;
    const value = BigInt(only(c.Integer, 'integer').image).toString();
    const span = this.nodeSpan(node);
    const name = c.Name?.[0];
    if (name) return { kind: 'scaled', coefficient: value, term: this.nameRef(name), span };
    if (c.Tau) return { kind: 'scaled', coefficient: value, term: null, span };
    return { kind: 'number', value, span };
  }

  private rankinCohen(node: Cst.RankinCohenCstNode): SyntaxExpr {
    const c = node.children;
    const subscript = only(c.Subscript, 'order');
    return {
      kind: 'bracket',
      left: this.expression(c.expression[0]!),
      right: this.expression(c.expression[1]!),
      order: readSubscript(subscript.image.slice(1)).subscript,
      orderSpan: tokenSpan(subscript, this.file),
      span: this.nodeSpan(node),
    };
  }

  private nameRef(token: IToken): NameRef {
    const reading = readName(token.image);
    return { name: reading.canonical, parts: reading.parts, written: token.image, span: tokenSpan(token, this.file) };
  }

  private nodeSpan(node: CstNode): Span {
    const l = node.location;
    if (l === undefined || l.endOffset === undefined || Number.isNaN(l.endOffset)) {
      throw new MissingChildError(`no location for ${node.name}`);
    }
    return {
      file: this.file,
      startLine: l.startLine ?? 1,
      startColumn: l.startColumn ?? 1,
      endLine: l.endLine ?? 1,
      endColumn: (l.endColumn ?? 0) + 1,
      startOffset: l.startOffset,
      endOffset: l.endOffset + 1,
    };
  }

  private source(span: Span): string {
    return this.text.slice(span.startOffset, span.endOffset);
  }

  private report(template: DiagnosticTemplate, args: Readonly<Record<string, string>>, span: Span): void {
    this.diagnostics.push(diagnostic(template, args, span));
  }
}

/** Null when `rows` form a square symmetric matrix (entries compared in lowest terms). */
export function matrixShapeProblem(rows: readonly (readonly string[])[]): string | null {
  const n = rows.length;
  const bad = rows.findIndex((row) => row.length !== n);
  if (bad >= 0) return `row ${bad + 1} has ${plural(rows[bad]!.length, 'entry', 'entries')}, the matrix ${plural(n, 'row', 'rows')}`;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      if (rows[i]![j] !== rows[j]![i]) return `entry (${i + 1},${j + 1}) is ${rows[i]![j]}, entry (${j + 1},${i + 1}) is ${rows[j]![i]}`;
    }
  }
  return null;
}

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}
