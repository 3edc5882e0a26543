/**
 * Runs the parser on one statement's tokens (or one command-line expression), ending
 * them with the synthetic Newline that the grammar expects at the end of a statement.
 */
import type { IToken } from 'chevrotain';
import { createTokenInstance } from './chevrotain-runtime.js';
import type * as Cst from './cst-types.js';
import { codes } from './diagnostic-codes.js';
import { diagnostic, type Diagnostic } from './diagnostic.js';
import { claimParser } from './parser.js';
import { tokenSpan } from './span-of.js';
import { syntaxDiagnostic } from './syntax-errors.js';
import { Newline } from './tokens.js';

export type ParseOutcome<T> = { readonly ok: true; readonly cst: T } | { readonly ok: false; readonly diagnostic: Diagnostic };

export function parseStatementTokens(tokens: readonly IToken[], file: string): ParseOutcome<Cst.StatementCstNode> {
  const input = withEndOfLine(tokens);
  claimParser.input = input;
  const cst = claimParser.statementLine() as Cst.StatementLineCstNode;
  const error = claimParser.errors[0];
  if (error) return { ok: false, diagnostic: syntaxDiagnostic(error, input, file) };
  const statement = cst.children.statement[0];
  return statement ? { ok: true, cst: statement } : internalFailure(input, file);
}

export function parseExpressionTokens(tokens: readonly IToken[], file: string): ParseOutcome<Cst.ExpressionCstNode> {
  const input = withEndOfLine(tokens);
  claimParser.input = input;
  const cst = claimParser.expressionLine() as Cst.ExpressionLineCstNode;
  const error = claimParser.errors[0];
  if (error) return { ok: false, diagnostic: syntaxDiagnostic(error, input, file) };
  const expression = cst.children.expression[0];
  return expression ? { ok: true, cst: expression } : internalFailure(input, file);
}

function withEndOfLine(tokens: readonly IToken[]): IToken[] {
  const last = tokens[tokens.length - 1];
  const offset = last ? (last.endOffset ?? last.startOffset) + 1 : 0;
  const line = last?.endLine ?? 1;
  const column = last ? (last.endColumn ?? 0) + 1 : 1;
  // An empty image: the token marks a position, its span is empty.
  return [...tokens, createTokenInstance(Newline, '', offset, offset - 1, line, line, column, column - 1)];
}

/** A parse without errors but without a tree cannot happen; say so rather than crash. */
function internalFailure<T>(input: readonly IToken[], file: string): ParseOutcome<T> {
  const span = tokenSpan(input[0]!, file);
  return { ok: false, diagnostic: diagnostic(codes.internalError, { detail: 'the parser returned no tree' }, span) };
}
