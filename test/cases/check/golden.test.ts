/**
 * Golden files of the checker: each `*.claim` here is checked through the command
 * line (`check --format json`, in-process) and the report, with `seconds` removed
 * and the version replaced by a placeholder (both change without the verdicts
 * changing), is compared with `*.verdict.json`. STURMCHECK_ACCEPT=1 (`npm run
 * accept`) rewrites the baselines; review the diff before committing.
 */
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { runCli } from '../../../src/cli/run-cli.js';

const here = dirname(fileURLToPath(import.meta.url));
const accept = process.env['STURMCHECK_ACCEPT'] === '1';
const cases = readdirSync(here).filter((f) => f.endsWith('.claim')).sort();

interface Report {
  version: string;
  claims: Record<string, unknown>[];
}

async function actualReport(name: string): Promise<string> {
  let stdout = '';
  let stderr = '';
  await runCli(['check', '--format', 'json', name], {
    stdout: (t) => (stdout += t),
    stderr: (t) => (stderr += t),
    stdoutIsTerminal: false,
    stderrIsTerminal: false,
    env: {},
    // Paths in the report are as given, relative to this folder, so baselines do not depend on where the tests run.
    cwd: here,
  });
  expect(stderr).toBe('');
  const report = JSON.parse(stdout) as Report;
  report.version = '<version>';
  for (const c of report.claims) {
    expect(typeof c['seconds']).toBe('number');
    delete c['seconds'];
  }
  return `${JSON.stringify(report, null, 2)}\n`;
}

describe('check golden files', () => {
  test('there are enough cases', () => {
    expect(cases.length).toBeGreaterThanOrEqual(12);
  });

  for (const name of cases) {
    test(name, async () => {
      const actual = await actualReport(name);
      const path = join(here, name.replace(/\.claim$/, '.verdict.json'));
      if (accept) {
        writeFileSync(path, actual);
        return;
      }
      expect(existsSync(path), `no baseline for ${name}; run npm run accept and review it`).toBe(true);
      expect(actual).toBe(readFileSync(path, 'utf8'));
    });
  }
});
