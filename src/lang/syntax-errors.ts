/**
 * Turns the parser's first error in a statement into a diagnostic that says what was
 * expected in the user's terms: "expected ')' to close 'theta(' opened at 3:14".
 * Later errors in the same statement are usually echoes of the first, so one
 * statement yields one syntax diagnostic; every statement is parsed, so every broken
 * statement in a file is reported.
 */
import type { IRecognitionException, IToken, TokenType } from 'chevrotain';
import { tokenMatcher } from './chevrotain-runtime.js';
import { codes } from './diagnostic-codes.js';
import { diagnostic, type Diagnostic } from './diagnostic.js';
import { decodeProblem, type ParseProblem } from './parse-problems.js';
import { positionText, tokenSpan } from './span-of.js';
import {
  CLOSERS,
  Jacobi,
  LBrace,
  LBracket,
  LParen,
  Name,
  Newline,
  OPENERS,
  PARSER_TOKENS,
  RBrace,
  RBracket,
  RParen,
  Tau,
  ThetaKeyword,
} from './tokens.js';

const RULE_DESCRIPTIONS: Readonly<Record<string, string>> = {
  statementLine: 'a statement (claim, let, assume, lattice or variables)',
  statement: 'a statement (claim, let, assume, lattice or variables)',
  expressionLine: 'an expression',
  expression: 'an expression',
  product: 'an expression',
  unary: 'an expression',
  power: 'an expression',
  postfix: 'an expression',
  primary: 'an expression',
  exponent: 'an integer exponent',
  relation: "'==' or 'is'",
  expectation: 'proved, refuted or unproved',
  indexSpec: "'index' or 'lattice'",
  latticeSpec: 'a matrix or a lattice name',
  qualifier: 'weak, holomorphic or cusp',
};

const CLOSER_OF: ReadonlyMap<TokenType, TokenType> = new Map([
  [LParen, RParen],
  [LBracket, RBracket],
  [LBrace, RBrace],
]);

export function syntaxDiagnostic(
  error: IRecognitionException,
  statementTokens: readonly IToken[],
  file: string,
): Diagnostic {
  const token = error.token;
  const span = tokenSpan(token, file);
  const found = describeFound(token);
  const problem = decodeProblem(error.message);
  if (problem === null) return diagnostic(codes.unexpectedToken, { expected: 'something else', found }, span);
  if (problem.kind === 'extraInput' || (problem.kind === 'mismatch' && problem.expected[0] === Newline.name)) {
    return extraInput(token, statementTokens, found, file);
  }
  const opener = problem.kind === 'mismatch' ? unclosedOpener(problem, token, statementTokens) : null;
  if (opener) return unclosedBracketDiagnostic(opener, statementTokens, span, [`found ${found}`]);
  return diagnostic(codes.unexpectedToken, { expected: describeExpected(problem), found }, span);
}

/** The diagnostic for an open bracket that its statement never closes. */
export function unclosedBracketDiagnostic(
  opener: IToken,
  statementTokens: readonly IToken[],
  at: ReturnType<typeof tokenSpan>,
  notes: readonly string[],
): Diagnostic {
  const closer = CLOSER_OF.get(opener.tokenType) ?? RParen;
  return diagnostic(
    codes.unclosedBracket,
    {
      closer: closer.LABEL?.replace(/'/g, '') ?? ')',
      opener: openerLabel(opener, statementTokens),
      position: positionText(tokenSpan(opener, at.file)),
    },
    at,
    notes,
  );
}

function extraInput(token: IToken, statementTokens: readonly IToken[], found: string, file: string): Diagnostic {
  const index = statementTokens.indexOf(token);
  const previous = index > 0 ? statementTokens[index - 1] : undefined;
  const onNextLine = previous !== undefined && (token.startLine ?? 0) > (previous.endLine ?? 0);
  const notes = onNextLine ? ['a line indented deeper than the statement continues it'] : [];
  return diagnostic(codes.extraInput, { found }, tokenSpan(token, file), notes);
}

/** When a closer was expected, the opener it would close: the innermost still open. */
function unclosedOpener(problem: ParseProblem, token: IToken, statementTokens: readonly IToken[]): IToken | null {
  const expected = problem.expected[0];
  if (!CLOSERS.some((c) => c.name === expected)) return null;
  const open: IToken[] = [];
  for (const t of statementTokens) {
    if (t === token || t.startOffset >= token.startOffset) break;
    if (OPENERS.includes(t.tokenType)) open.push(t);
    else if (CLOSERS.includes(t.tokenType)) open.pop();
  }
  const innermost = open[open.length - 1];
  return innermost && CLOSER_OF.get(innermost.tokenType)?.name === expected ? innermost : null;
}

/** `theta(`, `Theta[`, `jacobi(`: the opener with the word it belongs to, if any. */
function openerLabel(opener: IToken, statementTokens: readonly IToken[]): string {
  const index = statementTokens.indexOf(opener);
  const previous = index > 0 ? statementTokens[index - 1] : undefined;
  const attached =
    previous !== undefined &&
    (previous.endOffset ?? -2) + 1 === opener.startOffset &&
    [Name, Tau, ThetaKeyword, Jacobi].some((type) => tokenMatcher(previous, type));
  return attached ? previous.image + opener.image : opener.image;
}

function describeFound(token: IToken): string {
  if (tokenMatcher(token, Newline)) return 'the end of the line';
  if (token.image === '') return 'the end of the input';
  return `'${token.image}'`;
}

function describeExpected(problem: ParseProblem): string {
  if (problem.kind !== 'mismatch') {
    const description = RULE_DESCRIPTIONS[problem.ruleName];
    if (description !== undefined) return description;
  }
  const labels = [...new Set(problem.expected.map(labelOf))];
  if (labels.length <= 1) return labels[0] ?? 'something else';
  return `${labels.slice(0, -1).join(', ')} or ${labels[labels.length - 1]!}`;
}

function labelOf(tokenName: string): string {
  const type = PARSER_TOKENS.find((t) => t.name === tokenName);
  return type?.LABEL ?? tokenName;
}
