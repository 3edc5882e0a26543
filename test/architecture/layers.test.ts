/**
 * ARCHITECTURE.md: layers, lowest first, series → forms → lang → types → bound →
 * verdict → check → report → cli; a file imports only from its own layer or lower
 * ones, and only cli touches `process`.
 */
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';

const LAYERS = ['series', 'forms', 'lang', 'types', 'bound', 'verdict', 'check', 'report', 'cli'];
const SRC = resolve(dirname(fileURLToPath(import.meta.url)), '../../src');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? files(p) : p.endsWith('.ts') ? [p] : [];
  });
}

describe('layering', () => {
  const all = files(SRC);
  it('every file lives in a known layer', () => {
    for (const f of all) expect(LAYERS).toContain(relative(SRC, f).split('/')[0]);
  });
  it('imports go to the same layer or lower ones', () => {
    const bad: string[] = [];
    for (const f of all) {
      const layer = relative(SRC, f).split('/')[0]!;
      const text = readFileSync(f, 'utf8');
      for (const m of text.matchAll(/from '(\.[^']+)'/g)) {
        const target = relative(SRC, resolve(dirname(f), m[1]!)).split('/')[0]!;
        if (LAYERS.indexOf(target) > LAYERS.indexOf(layer)) bad.push(`${relative(SRC, f)} → ${m[1]}`);
      }
    }
    expect(bad).toEqual([]);
  });
  it('only cli touches process', () => {
    const bad = all.filter((f) => !relative(SRC, f).startsWith('cli/') && /\bprocess\.(argv|exit|stdout|stderr|env|cwd)/.test(readFileSync(f, 'utf8')));
    expect(bad.map((f) => relative(SRC, f))).toEqual([]);
  });
  it('no `any` in src', () => {
    const code = (f: string): string => readFileSync(f, 'utf8').replace(/\/\*[\s\S]*?\*\//g, '').replace(/\/\/.*$/gm, '');
    const bad = all.filter((f) => /(:\s*any\b|as any\b|<any>)/.test(code(f)));
    expect(bad.map((f) => relative(SRC, f))).toEqual([]);
  });
});
