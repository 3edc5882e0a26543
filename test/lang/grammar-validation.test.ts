/**
 * The claim grammar and lexer pass chevrotain's own validations (ambiguity, left
 * recursion, unreachable alternatives, token patterns), which every run skips for
 * start-up time (src/lang/parser.ts).
 */
import { describe, expect, it } from 'vitest';
import { ClaimParser } from '../../src/lang/parser.js';
import { makeClaimLexer } from '../../src/lang/tokens.js';

describe('grammar validation', () => {
  it('the parser builds with every validation on', () => {
    expect(() => new ClaimParser(true)).not.toThrow();
  });
  it('the lexer builds with every validation on and reports no definition errors', () => {
    const lexer = makeClaimLexer(true);
    expect(lexer.lexerDefinitionErrors).toEqual([]);
  });
});
