/**
 * Splits a token stream into statements by the NEWLINE rules of CLAIMS.md: a line
 * break ends a statement unless brackets are open, the last token is one of
 * `+ - * / ^ == , :`, or the next non-blank line is indented deeper than the
 * statement's first line; a statement keyword in column 1 always starts a statement.
 * Blank and comment lines carry no tokens, so they never end a continuation.
 */
import type { IToken, TokenType } from 'chevrotain';
import { CLOSERS, CONTINUATION_TOKENS, OPENERS, STATEMENT_KEYWORDS } from './tokens.js';

export interface StatementChunk {
  readonly tokens: readonly IToken[];
  readonly firstLine: number;
  readonly lastLine: number;
  /** Brackets still open at the end of the statement, innermost last. */
  readonly unclosed: readonly IToken[];
  /** The column-1 keyword that cut this statement short, if brackets were open. */
  readonly cutBy: IToken | null;
}

interface OpenChunk {
  tokens: IToken[];
  indent: number;
  brackets: IToken[];
}

export function splitStatements(tokens: readonly IToken[]): StatementChunk[] {
  const chunks: StatementChunk[] = [];
  let current: OpenChunk | null = null;
  for (const line of groupByLine(tokens)) {
    const first = line[0]!;
    const keywordInColumnOne = isStatementKeyword(first.tokenType) && first.startColumn === 1;
    if (current !== null && (keywordInColumnOne || !continues(current, first))) {
      chunks.push(close(current, keywordInColumnOne ? first : null));
      current = null;
    }
    current ??= { tokens: [], indent: first.startColumn ?? 1, brackets: [] };
    for (const token of line) {
      current.tokens.push(token);
      trackBrackets(current.brackets, token);
    }
  }
  if (current !== null) chunks.push(close(current, null));
  return chunks;
}

/** Whether the line starting with `first` continues the statement `chunk`. */
function continues(chunk: OpenChunk, first: IToken): boolean {
  const last = chunk.tokens[chunk.tokens.length - 1]!;
  return (
    chunk.brackets.length > 0 ||
    CONTINUATION_TOKENS.includes(last.tokenType) ||
    (first.startColumn ?? 1) > chunk.indent
  );
}

function trackBrackets(stack: IToken[], token: IToken): void {
  if (OPENERS.includes(token.tokenType)) stack.push(token);
  // A mismatched closer still closes: the parser names the mismatch more precisely.
  else if (CLOSERS.includes(token.tokenType)) stack.pop();
}

function close(chunk: OpenChunk, cutBy: IToken | null): StatementChunk {
  const tokens = chunk.tokens;
  return {
    tokens,
    firstLine: tokens[0]?.startLine ?? 1,
    lastLine: tokens[tokens.length - 1]?.endLine ?? 1,
    unclosed: [...chunk.brackets],
    cutBy: chunk.brackets.length > 0 ? cutBy : null,
  };
}

function groupByLine(tokens: readonly IToken[]): IToken[][] {
  const lines: IToken[][] = [];
  let lineNumber = -1;
  for (const token of tokens) {
    if (token.startLine !== lineNumber) {
      lines.push([]);
      lineNumber = token.startLine ?? 1;
    }
    lines[lines.length - 1]!.push(token);
  }
  return lines;
}

export function isStatementKeyword(type: TokenType): boolean {
  return STATEMENT_KEYWORDS.includes(type);
}
