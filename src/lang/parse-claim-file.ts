/**
 * The front end for a claim file: lex, cut into statements, parse each, convert to
 * the syntax tree, resolve names. Never throws; every problem is a diagnostic, and
 * every statement without one is kept.
 */
import type { IToken } from 'chevrotain';
import type { ClaimFile } from './ast.js';
import { codes } from './diagnostic-codes.js';
import { diagnostic, type Diagnostic } from './diagnostic.js';
import { normaliseSource } from './decode-source.js';
import { splitStatements, type StatementChunk } from './layout.js';
import { lex } from './lex.js';
import { readName } from './names.js';
import { DEFAULT_VARIABLES, resolveStatements, type StatementItem } from './resolve-statements.js';
import { parseStatementTokens } from './run-parser.js';
import { spanAfter, tokenSpan } from './span-of.js';
import { unclosedBracketDiagnostic } from './syntax-errors.js';
import { CstConverter } from './to-syntax.js';
import { Let, Name } from './tokens.js';

export interface ParsedClaimFile {
  readonly ast: ClaimFile;
  readonly diagnostics: Diagnostic[];
}

export function parseClaimFile(source: string, file: string): ParsedClaimFile {
  const text = normaliseSource(source);
  try {
    return parseNormalised(text, file);
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    return {
      ast: { file, text, variables: DEFAULT_VARIABLES, statements: [] },
      diagnostics: [diagnostic(codes.internalError, { detail }, null)],
    };
  }
}

function parseNormalised(text: string, file: string): ParsedClaimFile {
  const lexed = lex(text, file);
  const diagnostics: Diagnostic[] = [...lexed.diagnostics];
  const errorLines = new Set(lexed.diagnostics.map((d) => d.span?.startLine));
  const items = splitStatements(lexed.tokens).map((chunk) => {
    const hasLexicalError = [...errorLines].some((l) => l !== undefined && l >= chunk.firstLine && l <= chunk.lastLine);
    const read = hasLexicalError ? broken(chunk, []) : readStatement(chunk, text, file);
    diagnostics.push(...read.diagnostics);
    return read.item;
  });
  const resolved = resolveStatements(items, text);
  diagnostics.push(...resolved.diagnostics);
  return {
    ast: { file, text, variables: resolved.variables, statements: resolved.statements },
    diagnostics: sortByPosition(diagnostics),
  };
}

interface ReadStatement {
  readonly item: StatementItem;
  readonly diagnostics: readonly Diagnostic[];
}

function readStatement(chunk: StatementChunk, text: string, file: string): ReadStatement {
  const innermost = chunk.unclosed[chunk.unclosed.length - 1];
  if (innermost) return broken(chunk, [unclosedAtEnd(chunk, innermost, file)]);
  const parsed = parseStatementTokens(chunk.tokens, file);
  if (!parsed.ok) return broken(chunk, [parsed.diagnostic]);
  const converter = new CstConverter(text, file);
  const statement = converter.statement(parsed.cst);
  if (converter.diagnostics.length > 0) return broken(chunk, converter.diagnostics);
  return { item: { kind: 'parsed', statement }, diagnostics: [] };
}

/** Reported where the statement was cut: at the column-1 keyword, or after its last token. */
function unclosedAtEnd(chunk: StatementChunk, opener: IToken, file: string): Diagnostic {
  if (chunk.cutBy) {
    return unclosedBracketDiagnostic(opener, chunk.tokens, tokenSpan(chunk.cutBy, file), [
      'a statement keyword in column 1 always starts a new statement',
    ]);
  }
  const last = chunk.tokens[chunk.tokens.length - 1]!;
  return unclosedBracketDiagnostic(opener, chunk.tokens, spanAfter(tokenSpan(last, file)), []);
}

/** A dropped statement; a `let` keeps its name so that its uses are not "unknown". */
function broken(chunk: StatementChunk, diagnostics: readonly Diagnostic[]): ReadStatement {
  const [first, second] = chunk.tokens;
  const letName = first?.tokenType === Let && second?.tokenType === Name ? readName(second.image).canonical : null;
  return { item: { kind: 'broken', line: chunk.firstLine, letName }, diagnostics };
}

function sortByPosition(diagnostics: readonly Diagnostic[]): Diagnostic[] {
  return [...diagnostics].sort((a, b) => (a.span?.startOffset ?? -1) - (b.span?.startOffset ?? -1));
}
