/**
 * Files generated from the parser: the CST types (src/lang/cst-types.ts) and the
 * syntax diagrams (grammar/syntax-diagrams.html). STURMCHECK_ACCEPT=1 rewrites them.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { cstTypesSource } from '../../src/lang/generate-cst-types.js';
import { claimParser } from '../../src/lang/parser.js';
import { syntaxDiagramsHtml } from '../../src/lang/syntax-diagrams.js';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const accept = process.env['STURMCHECK_ACCEPT'] === '1';

function compareOrAccept(relativePath: string, actual: string): void {
  const path = join(root, relativePath);
  if (accept) writeFileSync(path, actual);
  else expect(actual, `${relativePath} is stale; run STURMCHECK_ACCEPT=1 npx vitest run test/lang`).toBe(readFileSync(path, 'utf8'));
}

describe('generated from the parser', () => {
  test('CST types are up to date', () => {
    compareOrAccept('src/lang/cst-types.ts', cstTypesSource());
  });

  test('syntax diagrams are up to date', () => {
    compareOrAccept('grammar/syntax-diagrams.html', syntaxDiagramsHtml());
  });

  test('syntax diagrams load nothing from the network', () => {
    const html = syntaxDiagramsHtml();
    expect(html).not.toMatch(/<script[^>]*\ssrc=/i);
    expect(html).not.toMatch(/<link[^>]*\shref=/i);
    expect(html).not.toContain('unpkg.com');
    expect(html).toContain('window.serializedGrammar');
  });

  test('every parser rule appears in grammar/claims.ebnf', () => {
    const ebnf = readFileSync(join(root, 'grammar', 'claims.ebnf'), 'utf8');
    const defined = new Set([...ebnf.matchAll(/^\s*(\w+)\s*=/gm)].map((m) => m[1]));
    const rules = claimParser.getGAstProductions();
    for (const name of Object.keys(rules)) expect(defined.has(name), `rule ${name} missing from claims.ebnf`).toBe(true);
    for (const name of defined) expect(name !== undefined && name in rules, `claims.ebnf defines ${name ?? ''}, the parser does not`).toBe(true);
  });
});
