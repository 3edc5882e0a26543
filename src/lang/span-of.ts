/** Spans built from tokens and from other spans. */
import type { IToken } from 'chevrotain';
import type { Span } from './span.js';

/** The span of one token; Chevrotain's end column and offset are inclusive, ours exclusive. */
export function tokenSpan(token: IToken, file: string): Span {
  const startLine = token.startLine ?? 1;
  const startColumn = token.startColumn ?? 1;
  const length = token.image.length;
  return {
    file,
    startLine,
    startColumn,
    endLine: token.endLine ?? startLine,
    endColumn: (token.endColumn ?? startColumn + length - 1) + 1,
    startOffset: token.startOffset,
    endOffset: (token.endOffset ?? token.startOffset + length - 1) + 1,
  };
}

/** From the start of `first` to the end of `last`. */
export function joinSpans(first: Span, last: Span): Span {
  return {
    file: first.file,
    startLine: first.startLine,
    startColumn: first.startColumn,
    endLine: last.endLine,
    endColumn: last.endColumn,
    startOffset: first.startOffset,
    endOffset: last.endOffset,
  };
}

/** The empty position just after `span`, where something missing was expected. */
export function spanAfter(span: Span): Span {
  return {
    file: span.file,
    startLine: span.endLine,
    startColumn: span.endColumn,
    endLine: span.endLine,
    endColumn: span.endColumn,
    startOffset: span.endOffset,
    endOffset: span.endOffset,
  };
}

/** The span of `length` characters at `offset` of `text` (for lexical errors and decoding). */
export function spanAtOffset(text: string, offset: number, length: number, file: string): Span {
  const before = text.slice(0, offset);
  const line = before.split('\n').length;
  const column = offset - (before.lastIndexOf('\n') + 1) + 1;
  return {
    file,
    startLine: line,
    startColumn: column,
    endLine: line,
    endColumn: column + length,
    startOffset: offset,
    endOffset: offset + length,
  };
}

/** `line:column`, as messages quote positions. */
export function positionText(span: Span): string {
  return `${span.startLine}:${span.startColumn}`;
}
