/** A source range: 1-based lines and columns, 0-based offsets, end exclusive. */
export interface Span {
  readonly file: string;
  readonly startLine: number;
  readonly startColumn: number;
  readonly endLine: number;
  readonly endColumn: number;
  readonly startOffset: number;
  readonly endOffset: number;
}
