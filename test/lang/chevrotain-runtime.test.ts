/**
 * The parser runs on chevrotain's single-file build (src/lang/chevrotain-runtime.ts):
 * it must offer everything the package entry offers, and be the one in use.
 */
import { describe, expect, it } from 'vitest';
import * as entry from 'chevrotain';
import { CHEVROTAIN_BUILD, CstParser, Lexer } from '../../src/lang/chevrotain-runtime.js';

describe("chevrotain's single-file build", () => {
  it('exports every name the package entry exports', async () => {
    const build = (await import(CHEVROTAIN_BUILD)) as Record<string, unknown>;
    expect(Object.keys(build).sort()).toEqual(Object.keys(entry).sort());
    expect(build['VERSION']).toBe(entry.VERSION);
  });
  it('is the runtime the parser uses (not the entry, whose load costs hundreds of milliseconds)', async () => {
    const build = (await import(CHEVROTAIN_BUILD)) as Record<string, unknown>;
    expect(CstParser).toBe(build['CstParser']);
    expect(Lexer).toBe(build['Lexer']);
    expect(CstParser).not.toBe(entry.CstParser);
  });
});
