/**
 * The parser runs on chevrotain's single-file build (src/lang/chevrotain-runtime.ts):
 * it must offer everything the package entry offers, and be the one in use.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import * as entry from 'chevrotain';
import { CHEVROTAIN_BUILD, CstParser, Lexer } from '../../src/lang/chevrotain-runtime.js';
import { claimParser } from '../../src/lang/parser.js';
import { claimLexer } from '../../src/lang/tokens.js';

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
    expect(claimParser).toBeInstanceOf(build['CstParser'] as typeof entry.CstParser);
    expect(claimParser).not.toBeInstanceOf(entry.CstParser);
    expect(claimLexer).toBeInstanceOf(build['Lexer'] as typeof entry.Lexer);
    expect(claimLexer).not.toBeInstanceOf(entry.Lexer);
  });
});

describe('runtime imports of chevrotain', () => {
  it('come from chevrotain-runtime.ts only: any other would load the package entry too', () => {
    const src = fileURLToPath(new URL('../../src', import.meta.url));
    const offenders: string[] = [];
    const walk = (dir: string): void => {
      for (const e of readdirSync(dir, { withFileTypes: true })) {
        const path = join(dir, e.name);
        if (e.isDirectory()) walk(path);
        else if (e.name.endsWith('.ts') && e.name !== 'chevrotain-runtime.ts') {
          const text = readFileSync(path, 'utf8');
          for (const m of text.matchAll(/^import\s+(?!type\b)[^;]*from\s+'chevrotain'/gm)) offenders.push(`${path}: ${m[0]}`);
          if (text.includes("import('chevrotain')")) offenders.push(`${path}: dynamic import`);
        }
      }
    };
    walk(src);
    expect(offenders).toEqual([]);
  });
});
