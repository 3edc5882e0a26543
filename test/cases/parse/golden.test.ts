/**
 * Golden files: each `*.claim` here is parsed; the AST (spans as `line:col-line:col`)
 * goes to `*.ast.json` when the file has no diagnostics, the formatted diagnostics and
 * the statements kept go to `*.diagnostics.txt` otherwise. STURMCHECK_ACCEPT=1 (`npm
 * run accept`) rewrites the baselines; review the diff before committing.
 */
import { existsSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { decodeSource, formatDiagnostic, parseClaimFile, type Span, type Statement } from '../../../src/lang/index.js';

const here = dirname(fileURLToPath(import.meta.url));
const accept = process.env['STURMCHECK_ACCEPT'] === '1';
const cases = readdirSync(here).filter((f) => f.endsWith('.claim')).sort();

function isSpan(value: unknown): value is Span {
  return typeof value === 'object' && value !== null && 'startLine' in value && 'endOffset' in value;
}

function spanText(s: Span): string {
  return `${s.startLine}:${s.startColumn}-${s.endLine}:${s.endColumn}`;
}

function astJson(variables: readonly string[], statements: readonly Statement[]): string {
  const replacer = (_key: string, value: unknown): unknown => (isSpan(value) ? spanText(value) : value);
  return `${JSON.stringify({ variables, statements }, replacer, 2)}\n`;
}

function statementSummary(s: Statement): string {
  const name = 'name' in s && typeof s.name === 'string' ? ` ${JSON.stringify(s.name)}` : '';
  return `line ${s.span.startLine}: ${s.kind}${name}`;
}

/** The expected output of one case: [baseline file name, content]. */
function actualOutput(name: string): [string, string] {
  const bytes = readFileSync(join(here, name));
  const decoded = decodeSource(bytes, name);
  if (!decoded.ok) return [name.replace(/\.claim$/, '.diagnostics.txt'), `${formatDiagnostic(decoded.diagnostic, '')}\n`];
  const { ast, diagnostics } = parseClaimFile(decoded.text, name);
  if (diagnostics.length === 0) return [name.replace(/\.claim$/, '.ast.json'), astJson(ast.variables, ast.statements)];
  const report = diagnostics.map((d) => formatDiagnostic(d, ast.text)).join('\n\n');
  const kept = ast.statements.map(statementSummary).join('\n');
  return [name.replace(/\.claim$/, '.diagnostics.txt'), `${report}\n\n--- statements kept ---\n${kept}\n`];
}

describe('parse golden files', () => {
  test('there are enough cases', () => {
    expect(cases.length).toBeGreaterThanOrEqual(25);
  });

  for (const name of cases) {
    test(name, () => {
      const [baseline, actual] = actualOutput(name);
      const path = join(here, baseline);
      const other = join(here, baseline.endsWith('.ast.json') ? name.replace(/\.claim$/, '.diagnostics.txt') : name.replace(/\.claim$/, '.ast.json'));
      if (accept) {
        writeFileSync(path, actual);
        if (existsSync(other)) rmSync(other);
        return;
      }
      expect(existsSync(path), `no baseline ${baseline}; run npm run accept and review it`).toBe(true);
      expect(existsSync(other), `stale baseline ${other}; run npm run accept`).toBe(false);
      expect(actual).toBe(readFileSync(path, 'utf8'));
    });
  }
});
