/**
 * The front end for one expression from the command line (`sturmcheck expand EXPR`),
 * in the given variables; no lets or lattices are in scope.
 */
import type { Expr } from './ast.js';
import { codes } from './diagnostic-codes.js';
import { diagnostic, type Diagnostic } from './diagnostic.js';
import { normaliseSource } from './decode-source.js';
import { lex } from './lex.js';
import { readName } from './names.js';
import { ExprResolver } from './resolve-expr.js';
import { parseExpressionTokens } from './run-parser.js';
import { spanAtOffset } from './span-of.js';
import { CstConverter } from './to-syntax.js';

export interface ParsedExpression {
  readonly expr: Expr | null;
  readonly diagnostics: Diagnostic[];
}

export function parseExpression(source: string, variables: readonly string[], file = '<expression>'): ParsedExpression {
  const text = normaliseSource(source);
  try {
    return parseNormalised(text, variables, file);
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    return { expr: null, diagnostics: [diagnostic(codes.internalError, { detail }, null)] };
  }
}

function parseNormalised(text: string, variables: readonly string[], file: string): ParsedExpression {
  const lexed = lex(text, file);
  if (lexed.diagnostics.length > 0) return { expr: null, diagnostics: [...lexed.diagnostics] };
  if (lexed.tokens.length === 0) {
    return { expr: null, diagnostics: [diagnostic(codes.emptyExpression, {}, spanAtOffset(text, 0, 0, file))] };
  }
  const parsed = parseExpressionTokens(lexed.tokens, file);
  if (!parsed.ok) return { expr: null, diagnostics: [parsed.diagnostic] };
  const converter = new CstConverter(text, file);
  const syntax = converter.expression(parsed.cst);
  if (converter.diagnostics.length > 0) return { expr: null, diagnostics: converter.diagnostics };
  const names = variables.map((v) => readName(v).canonical);
  const resolver = new ExprResolver(
    { variables: names, fileVariables: names, lets: new Map(), brokenLets: new Map(), allLets: new Map(), lattices: new Map() },
    text,
  );
  const expr = resolver.resolve(syntax);
  return { expr: resolver.diagnostics.length > 0 ? null : expr, diagnostics: resolver.diagnostics };
}
