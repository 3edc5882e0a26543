/**
 * Runs the lexer and turns every lexical problem into a diagnostic. Malformed tokens
 * stay in the token stream (so that statement boundaries are found as usual); the
 * statement containing one is reported and not parsed.
 */
import type { IToken } from 'chevrotain';
import { codes } from './diagnostic-codes.js';
import { diagnostic, type Diagnostic } from './diagnostic.js';
import { readName, readSubscript, type NameProblem } from './names.js';
import { reduceRational } from './rational-literal.js';
import { spanAtOffset, tokenSpan } from './span-of.js';
import { BadString, claimLexer, DecimalNumber, LoneUnderscore, Name, Subscript } from './tokens.js';

export interface LexResult {
  readonly tokens: readonly IToken[];
  readonly diagnostics: readonly Diagnostic[];
}

export function lex(text: string, file: string): LexResult {
  const result = claimLexer.tokenize(text);
  const diagnostics: Diagnostic[] = result.errors.map((e) =>
    diagnostic(
      codes.unexpectedCharacter,
      { character: String.fromCodePoint(text.codePointAt(e.offset) ?? 0xfffd) },
      spanAtOffset(text, e.offset, e.length, file),
    ),
  );
  for (const token of result.tokens) {
    const problem = tokenProblem(token, file);
    if (problem) diagnostics.push(problem);
  }
  diagnostics.sort((a, b) => (a.span?.startOffset ?? 0) - (b.span?.startOffset ?? 0));
  return { tokens: result.tokens, diagnostics };
}

function tokenProblem(token: IToken, file: string): Diagnostic | null {
  const span = tokenSpan(token, file);
  switch (token.tokenType) {
    case Name: {
      const problem = readName(token.image).problem;
      return problem ? nameProblem(problem, token.image, span) : null;
    }
    case Subscript: {
      const { problem } = readSubscript(token.image.slice(1));
      return problem ? nameProblem(problem, token.image, span, `_{${token.image.slice(1)}}`) : null;
    }
    case BadString:
      return badString(token.image, span);
    case DecimalNumber:
      return diagnostic(codes.decimalNumber, { text: token.image, suggestion: decimalAsFraction(token.image) }, span);
    case LoneUnderscore:
      return diagnostic(codes.loneUnderscore, {}, span);
    default:
      return null;
  }
}

function nameProblem(
  problem: NameProblem,
  image: string,
  span: ReturnType<typeof tokenSpan>,
  bracedSubscript?: string,
): Diagnostic {
  switch (problem.kind) {
    case 'unbracedLong':
      return diagnostic(codes.unbracedSubscript, { suggestion: bracedSubscript ?? problem.suggestion }, span);
    case 'unclosedBrace':
      return diagnostic(codes.malformedSubscript, { name: image, reason: "the '{' is not closed on this line" }, span);
    case 'emptySubscript':
      return diagnostic(codes.malformedSubscript, { name: image, reason: 'the subscript is empty' }, span);
    case 'badSubscriptCharacter':
      return diagnostic(
        codes.malformedSubscript,
        { name: image, reason: `'${problem.character}' cannot appear in a subscript` },
        span,
      );
  }
}

function badString(image: string, span: ReturnType<typeof tokenSpan>): Diagnostic {
  if (image.length < 2 || !image.endsWith('"') || image.endsWith('\\"') && !image.endsWith('\\\\"')) {
    return diagnostic(codes.unterminatedString, {}, span);
  }
  return diagnostic(codes.badStringEscape, { reason: badStringReason(image) }, span);
}

function badStringReason(image: string): string {
  for (let i = 1; i < image.length - 1; i++) {
    const c = image.charCodeAt(i);
    if (c < 0x20) return `raw control character U+${c.toString(16).padStart(4, '0').toUpperCase()}`;
    if (image[i] === '\\') {
      const escape = image.slice(i, i + 6);
      if (!/^\\(?:["\\/bfnrt]|u[0-9a-fA-F]{4})/.test(escape)) return `bad escape '${escape.slice(0, 2)}'`;
      i += escape[1] === 'u' ? 5 : 1;
    }
  }
  return 'not a JSON string';
}

/** `1.5` → `3/2`, `2.` → `2`: the reduced fraction the user most likely meant. */
export function decimalAsFraction(text: string): string {
  const [whole = '0', fraction = ''] = text.split('.');
  const reduced = reduceRational(false, whole + fraction, `1${'0'.repeat(fraction.length)}`);
  return reduced.ok ? reduced.text : text;
}
