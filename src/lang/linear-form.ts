/**
 * Reads a syntax expression as a linear form Σ c_v·v with integer coefficients in the
 * variables in scope (`2z`, `z1 - z2`, `3 z1 + z2`, `-z`, `0`). Products by an integer
 * written with `*` (`2*z`) are accepted too; constants other than 0 are not.
 */
import type { LinearForm } from './ast.js';
import type { Span } from './span.js';
import type { SyntaxExpr } from './syntax-tree.js';

export type LinearFormResult =
  | { readonly ok: true; readonly form: LinearForm }
  | { readonly ok: false; readonly reason: string; readonly span: Span };

interface Affine {
  readonly constant: bigint;
  readonly coeffs: ReadonlyMap<string, bigint>;
}

class NotLinear extends Error {
  constructor(
    readonly reason: string,
    readonly span: Span,
  ) {
    super(reason);
  }
}

export function toLinearForm(
  expr: SyntaxExpr,
  variables: readonly string[],
  source: (span: Span) => string,
): LinearFormResult {
  try {
    const affine = new LinearReader(variables, source).read(expr);
    if (affine.constant !== 0n) {
      const reason = [...affine.coeffs.values()].some((c) => c !== 0n)
        ? 'a linear form has no constant term'
        : `the constant ${affine.constant} is not a linear form (only 0 is)`;
      return { ok: false, reason, span: expr.span };
    }
    return { ok: true, form: { coeffs: coefficientRecord(affine, variables, expr.span), span: expr.span } };
  } catch (e) {
    if (e instanceof NotLinear) return { ok: false, reason: e.reason, span: e.span };
    throw e;
  }
}

function coefficientRecord(affine: Affine, variables: readonly string[], span: Span): Record<string, number> {
  const coeffs: Record<string, number> = {};
  for (const v of variables) {
    const c = affine.coeffs.get(v) ?? 0n;
    if (c === 0n) continue;
    if (!Number.isSafeInteger(Number(c))) throw new NotLinear(`the coefficient ${c} is too large`, span);
    coeffs[v] = Number(c);
  }
  return coeffs;
}

class LinearReader {
  constructor(
    private readonly variables: readonly string[],
    private readonly source: (span: Span) => string,
  ) {}

  read(expr: SyntaxExpr): Affine {
    switch (expr.kind) {
      case 'number':
        return { constant: BigInt(expr.value), coeffs: new Map() };
      case 'name':
        return this.variable(expr.ref.name, expr.ref.written, expr.span, 1n);
      case 'scaled':
        if (expr.term === null) throw new NotLinear("'tau' is not a variable", expr.span);
        return this.variable(expr.term.name, expr.term.written, expr.span, BigInt(expr.coefficient));
      case 'paren':
        return this.read(expr.inner);
      case 'neg':
        return scale(this.read(expr.operand), -1n);
      case 'binary':
        return this.binary(expr);
      case 'power':
        throw new NotLinear('powers are not allowed in a linear form', expr.span);
      default:
        throw new NotLinear(`'${this.source(expr.span)}' is not a variable`, expr.span);
    }
  }

  private variable(name: string, written: string, span: Span, coefficient: bigint): Affine {
    if (!this.variables.includes(name)) throw new NotLinear(`'${written}' is not a variable`, span);
    return { constant: 0n, coeffs: new Map([[name, coefficient]]) };
  }

  private binary(expr: Extract<SyntaxExpr, { kind: 'binary' }>): Affine {
    if (expr.op === '/') throw new NotLinear('division is not allowed in a linear form', expr.span);
    const left = this.read(expr.left);
    const right = this.read(expr.right);
    if (expr.op === '+') return add(left, right, 1n);
    if (expr.op === '-') return add(left, right, -1n);
    if (isConstant(left)) return scale(right, left.constant);
    if (isConstant(right)) return scale(left, right.constant);
    throw new NotLinear('a product of variables is not linear', expr.span);
  }
}

function isConstant(a: Affine): boolean {
  return [...a.coeffs.values()].every((c) => c === 0n);
}

function scale(a: Affine, factor: bigint): Affine {
  return { constant: a.constant * factor, coeffs: new Map([...a.coeffs].map(([v, c]) => [v, c * factor])) };
}

function add(a: Affine, b: Affine, sign: bigint): Affine {
  const coeffs = new Map(a.coeffs);
  for (const [v, c] of b.coeffs) coeffs.set(v, (coeffs.get(v) ?? 0n) + sign * c);
  return { constant: a.constant + sign * b.constant, coeffs };
}
