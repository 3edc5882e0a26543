/**
 * `check --jobs N` (issue: parallel checking): worker threads across claim files, the
 * output in a deterministic order whatever finishes first. Workers run compiled code,
 * so this test compiles the sources once into test/artifacts/ (git-ignored) and runs
 * the command line from there.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const OUT = resolve(ROOT, 'test/artifacts/parallel-dist');
const CLAIMS = resolve(ROOT, 'test/artifacts/parallel-claims');

function run(...args: string[]): { code: number; stdout: string } {
  const r = spawnSync(process.execPath, [resolve(OUT, 'cli/main.js'), ...args], { cwd: ROOT, encoding: 'utf8' });
  return { code: r.status ?? -1, stdout: r.stdout };
}

beforeAll(() => {
  execFileSync(process.execPath, [resolve(ROOT, 'node_modules/typescript/bin/tsc'), '-p', resolve(ROOT, 'tsconfig.json'), '--outDir', OUT], { cwd: ROOT });
  mkdirSync(CLAIMS, { recursive: true });
  // a slow file first, so that later files finish before it when run in parallel
  writeFileSync(resolve(CLAIMS, 'a-slow.claim'), 'claim "slow": E_4^30 == E_4^30\nclaim "wrong" expect refuted: E_4^2 == 2*E_8\n');
  for (let i = 0; i < 5; i++) writeFileSync(resolve(CLAIMS, `b-${i}.claim`), `claim "quick ${i}": theta(z)^2/eta^6 == phi_{-2,1}\nclaim "also ${i}": E_4*E_6 == E_{10}\n`);
}, 120_000);

describe('check --jobs', () => {
  it('gives the same report, in the same order, with 1 and with 2 workers', () => {
    const one = run('check', CLAIMS, '--jobs', '1', '--format', 'json');
    const two = run('check', CLAIMS, '--jobs', '2', '--format', 'json');
    expect(one.code).toBe(0);
    expect(two.code).toBe(0);
    const strip = (s: string): unknown => (JSON.parse(s) as { claims: Record<string, unknown>[] }).claims.map(({ seconds: _s, ...rest }) => rest);
    expect(strip(two.stdout)).toEqual(strip(one.stdout));
    const names = (JSON.parse(two.stdout) as { claims: { name: string }[] }).claims.map((c) => c.name);
    expect(names.slice(0, 3)).toEqual(['slow', 'wrong', 'quick 0']);
  });
  it('gives it with 3 and with 8 workers too (more workers than cores, more than files)', () => {
    const strip = (s: string): unknown => (JSON.parse(s) as { claims: Record<string, unknown>[] }).claims.map(({ seconds: _s, ...rest }) => rest);
    const one = strip(run('check', CLAIMS, '--jobs', '1', '--format', 'json').stdout);
    for (const jobs of ['3', '8']) {
      const r = run('check', CLAIMS, '--jobs', jobs, '--format', 'json');
      expect(r.code).toBe(0);
      expect(strip(r.stdout)).toEqual(one);
    }
  });
  it('rejects --jobs 0', () => {
    expect(run('check', CLAIMS, '--jobs', '0').code).toBe(2);
  });
});
