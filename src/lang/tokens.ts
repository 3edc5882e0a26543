/**
 * The tokens of claim files (CLAIMS.md, "Lexical and grammar rules"). Line breaks are
 * skipped here: which of them end a statement is decided by `layout.ts` from the token
 * positions, because the rule depends on indentation and on the previous line.
 */
import type { TokenType } from 'chevrotain';
import { createToken, Lexer } from './chevrotain-runtime.js';
import { GREEK_CLASS } from './names.js';

const NAME_START = `A-Za-z${GREEK_CLASS}`;
const NAME_REST = `A-Za-z0-9${GREEK_CLASS}`;
/** `_x` or `_{…}`; a longer bare subscript (`E_10`) is matched whole so it can be diagnosed. */
const SUBSCRIPT = String.raw`_(?:\{[^}\n]*\}?|[A-Za-z0-9]+)`;

export const Whitespace = createToken({
  name: 'Whitespace',
  pattern: /[ \t\r\f\v\u00a0\u2009\u202f]+/,
  group: Lexer.SKIPPED,
});
export const LineBreak = createToken({
  name: 'LineBreak',
  pattern: /\n/,
  line_breaks: true,
  group: Lexer.SKIPPED,
});
export const Comment = createToken({ name: 'Comment', pattern: /#[^\n]*/, group: Lexer.SKIPPED });

/** Never produced by the lexer: `layout.ts` puts one at the end of every statement. */
export const Newline = createToken({ name: 'Newline', pattern: Lexer.NA, label: 'end of line' });

export const StringLiteral = createToken({
  name: 'StringLiteral',
  pattern: /"(?:[^"\\\u0000-\u001f]|\\(?:["\\/bfnrt]|u[0-9a-fA-F]{4}))*"/,
  label: 'a string',
});
/** A string that is not valid JSON (unterminated, bad escape, raw control character). */
export const BadString = createToken({ name: 'BadString', pattern: /"(?:[^"\\\n]|\\[^\n]?)*"?/ });
/** `1.5`: matched so that the error can say how to write a rational. */
export const DecimalNumber = createToken({ name: 'DecimalNumber', pattern: /[0-9]+\.[0-9]*/ });
export const Integer = createToken({ name: 'Integer', pattern: /[0-9]+/, label: 'an integer' });

export const Name = createToken({
  name: 'Name',
  pattern: new RegExp(`[${NAME_START}][${NAME_REST}]*(?:${SUBSCRIPT})?`),
  label: 'a name',
});

function keyword(name: string, word: string, alias?: string): TokenType {
  const pattern = new RegExp(alias === undefined ? word : `(?:${word}|${alias})`);
  return createToken({ name, pattern, longer_alt: Name, label: `'${word}'` });
}

export const Let = keyword('Let', 'let');
export const ClaimKeyword = keyword('ClaimKeyword', 'claim');
export const Expect = keyword('Expect', 'expect');
export const Proved = keyword('Proved', 'proved');
export const Refuted = keyword('Refuted', 'refuted');
export const Unproved = keyword('Unproved', 'unproved');
export const Is = keyword('Is', 'is');
export const Assume = keyword('Assume', 'assume');
export const Variables = keyword('Variables', 'variables');
export const LatticeKeyword = keyword('LatticeKeyword', 'lattice');
export const Jacobi = keyword('Jacobi', 'jacobi');
export const Weight = keyword('Weight', 'weight');
export const Index = keyword('Index', 'index');
export const Character = keyword('Character', 'character');
export const Weak = keyword('Weak', 'weak');
export const Holomorphic = keyword('Holomorphic', 'holomorphic');
export const Cusp = keyword('Cusp', 'cusp');
export const ThetaKeyword = keyword('ThetaKeyword', 'Theta');
export const Tau = keyword('Tau', 'tau', '\u03c4');

/** The subscript of a Rankin–Cohen bracket, `]_2`, `]_{10}`. */
export const Subscript = createToken({ name: 'Subscript', pattern: new RegExp(SUBSCRIPT), label: "the order '_n' of a bracket [f, g]_n" });
/** `_` followed by nothing a subscript may start with (`phi_-2`). */
export const LoneUnderscore = createToken({ name: 'LoneUnderscore', pattern: /_/ });

export const EqualEqual = createToken({ name: 'EqualEqual', pattern: /==/, label: "'=='" });
export const Equal = createToken({ name: 'Equal', pattern: /=/, label: "'='" });
export const LParen = createToken({ name: 'LParen', pattern: /\(/, label: "'('" });
export const RParen = createToken({ name: 'RParen', pattern: /\)/, label: "')'" });
export const LBracket = createToken({ name: 'LBracket', pattern: /\[/, label: "'['" });
export const RBracket = createToken({ name: 'RBracket', pattern: /\]/, label: "']'" });
export const LBrace = createToken({ name: 'LBrace', pattern: /\{/, label: "'{'" });
export const RBrace = createToken({ name: 'RBrace', pattern: /\}/, label: "'}'" });
export const Comma = createToken({ name: 'Comma', pattern: /,/, label: "','" });
export const Colon = createToken({ name: 'Colon', pattern: /:/, label: "':'" });
export const Plus = createToken({ name: 'Plus', pattern: /\+/, label: "'+'" });
/** `-` and U+2212 MINUS SIGN. */
export const Minus = createToken({ name: 'Minus', pattern: /[-\u2212]/, label: "'-'" });
/** `*`, `·` (U+00B7) and `⋅` (U+22C5). */
export const Star = createToken({ name: 'Star', pattern: /[*\u00b7\u22c5]/, label: "'*'" });
export const Slash = createToken({ name: 'Slash', pattern: /\//, label: "'/'" });
export const Caret = createToken({ name: 'Caret', pattern: /\^/, label: "'^'" });

/** Keywords that start a statement; one in column 1 always starts a new statement. */
export const STATEMENT_KEYWORDS: readonly TokenType[] = [Let, ClaimKeyword, Assume, Variables, LatticeKeyword];

/** A NEWLINE after one of these never ends a statement. */
export const CONTINUATION_TOKENS: readonly TokenType[] = [Plus, Minus, Star, Slash, Caret, EqualEqual, Comma, Colon];

/** Tokens that the lexer produces only to report them. */
export const ERROR_TOKENS: readonly TokenType[] = [BadString, DecimalNumber, LoneUnderscore];

export const OPENERS: readonly TokenType[] = [LParen, LBracket, LBrace];
export const CLOSERS: readonly TokenType[] = [RParen, RBracket, RBrace];

/** Lexer order: longer and more specific patterns first; keywords before Name. */
export const LEXER_TOKENS: readonly TokenType[] = [
  Whitespace,
  LineBreak,
  Comment,
  StringLiteral,
  BadString,
  DecimalNumber,
  Integer,
  Let,
  ClaimKeyword,
  Expect,
  Proved,
  Refuted,
  Unproved,
  Is,
  Assume,
  Variables,
  LatticeKeyword,
  Jacobi,
  Weight,
  Index,
  Character,
  Weak,
  Holomorphic,
  Cusp,
  ThetaKeyword,
  Tau,
  Name,
  Subscript,
  LoneUnderscore,
  EqualEqual,
  Equal,
  LParen,
  RParen,
  LBracket,
  RBracket,
  LBrace,
  RBrace,
  Comma,
  Colon,
  Plus,
  Minus,
  Star,
  Slash,
  Caret,
];

/** Every token type the parser knows, including the synthetic Newline. */
export const PARSER_TOKENS: readonly TokenType[] = [...LEXER_TOKENS, Newline];

/** `validate` as for the parser (parser.ts): the tests build the lexer validated. */
export function makeClaimLexer(validate = false): InstanceType<typeof Lexer> {
  return new Lexer([...LEXER_TOKENS], { positionTracking: 'full', ensureOptimizations: false, skipValidations: !validate });
}

export const claimLexer = makeClaimLexer();
