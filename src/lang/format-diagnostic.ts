/**
 * Plain-text rendering of a diagnostic, compiler style:
 *
 *   file:3:14: error SC-P003: expected ')' to close 'theta(' opened at 3:9
 *     let A = theta(z
 *                    ^
 *   note: …
 *
 * No colour: the report layer adds it where the terminal wants it.
 */
import type { Diagnostic } from './diagnostic.js';

export function formatDiagnostic(d: Diagnostic, text: string): string {
  const lines = [header(d)];
  const span = d.span;
  const source = span ? text.split('\n')[span.startLine - 1] : undefined;
  if (span && source !== undefined && span.startColumn <= source.length + 1) {
    lines.push(source, caretLine(source, span.startColumn, caretWidth(span, source)));
  }
  for (const note of d.notes ?? []) lines.push(`note: ${note}`);
  return lines.join('\n');
}

function header(d: Diagnostic): string {
  const where = d.span ? `${d.span.file}:${d.span.startLine}:${d.span.startColumn}: ` : '';
  return `${where}${d.severity} ${d.code}: ${d.message}`;
}

/** At least one character; a span running past its first line is underlined to the line's end. */
function caretWidth(span: NonNullable<Diagnostic['span']>, source: string): number {
  const end = span.endLine === span.startLine ? span.endColumn : source.length + 1;
  return Math.max(1, end - span.startColumn);
}

/** Tabs in the source are copied so that the caret lines up however tabs are shown. */
function caretLine(source: string, column: number, width: number): string {
  const pad = [...source.slice(0, column - 1)].map((c) => (c === '\t' ? '\t' : ' ')).join('');
  return `${pad}^${'~'.repeat(width - 1)}`;
}
