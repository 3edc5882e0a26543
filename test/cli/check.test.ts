/** `sturmcheck [check] PATH…` end to end (in-process): exit statuses, discovery, formats, options, colour. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync, chmodSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../src/cli/run-cli.js';
import { cli, type CliRun } from '../helpers/cli.js';

const CASES = 'test/cases/check';
const ALL_AS_EXPECTED = `${CASES}/example-from-claims-md.claim`;
const REFUTED = `${CASES}/refuted-by-coefficient.claim`;
const ILL_TYPED = `${CASES}/ill-typed-sum.claim`;
const ANSI = /\u001b\[/;

let dir = '';

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'sturmcheck-check-'));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

function file(relative: string, text: string | Uint8Array): string {
  const path = join(dir, relative);
  mkdirSync(join(path, '..'), { recursive: true });
  writeFileSync(path, text);
  return path;
}

/** Runs with chosen terminal flags and environment (the helper fixes both to "not a terminal", no env). */
async function cliWith(argv: string[], stdoutIsTerminal: boolean, env: Record<string, string>): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await runCli(argv, {
    stdout: (t) => (stdout += t),
    stderr: (t) => (stderr += t),
    stdoutIsTerminal,
    stderrIsTerminal: false,
    env,
    cwd: process.cwd(),
  });
  return { code, stdout, stderr };
}

describe('check: exit status', () => {
  it('0 when every claim got its expected verdict (expect refuted included)', async () => {
    const r = await cli('check', ALL_AS_EXPECTED);
    expect(r.code).toBe(0);
    expect(r.stderr).toBe('');
    expect(r.stdout).toContain('4 claims: 3 proved, 1 refuted, 0 unproved, 0 errors; all as expected');
  });

  it('check is the default command', async () => {
    const r = await cli(ALL_AS_EXPECTED);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('✓ proved    A is the weak generator of weight -2');
  });

  it('1 when a claim is refuted', async () => {
    const r = await cli('check', REFUTED);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('at q^1 ζ^0: left -2, right -288/143');
  });

  it('1 when a claim is an error', async () => {
    const r = await cli('check', ILL_TYPED);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('! error     weights 4 and 6 added');
  });

  it('2 for a missing path, and the other paths are still checked', async () => {
    const r = await cli('check', join(dir, 'no-such.claim'), ALL_AS_EXPECTED);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('no-such.claim: no such file or folder');
    expect(r.stdout).toContain('all as expected');
  });

  it('2 for a folder without *.claim', async () => {
    file('empty/notes.txt', 'not a claim file\n');
    const r = await cli('check', join(dir, 'empty'));
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('contains no *.claim file');
  });

  it('2 wins over 1', async () => {
    const r = await cli('check', REFUTED, join(dir, 'missing-folder'));
    expect(r.code).toBe(2);
    expect(r.stdout).toContain('✗ refuted');
  });

  it.each([
    [['--depth', '-1']],
    [['--jobs', '0']],
    [['--max-terms', 'many']],
    [['--format', 'xml']],
    [['--to', '3']],
    [['--bogus']],
  ])('2 for a bad option %j', async (opt) => {
    const r = await cli('check', ...opt, ALL_AS_EXPECTED);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
  });

  it('2 without a PATH', async () => {
    const r = await cli('check');
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('at least one PATH');
  });

  it('2 for a path that cannot be read', async () => {
    const path = file('locked/secret.claim', 'claim: E_4 == E_4\n');
    chmodSync(path, 0o000);
    const isRoot = process.getuid?.() === 0;
    const r = await cli('check', path);
    chmodSync(path, 0o644);
    // root reads the file anyway; then it is simply checked.
    expect(r.code).toBe(isRoot ? 0 : 2);
    if (!isRoot) expect(r.stderr).toContain('cannot read');
  });
});

describe('check: discovery', () => {
  it('a folder is searched recursively for *.claim, in sorted order', async () => {
    file('tree/b.claim', 'claim "b": E_4^2 == E_8\n');
    file('tree/a/z.claim', 'claim "a/z": E_4^2 == E_8\n');
    file('tree/a/y.claim', 'claim "a/y": E_4^2 == E_8\n');
    file('tree/c.txt', 'claim "ignored": E_4 == E_6\n');
    const r = await cli('check', '--format', 'json', join(dir, 'tree'));
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { claims: { name: string; file: string }[] };
    expect(out.claims.map((c) => c.name)).toEqual(['a/y', 'a/z', 'b']);
    expect(out.claims[0]!.file).toBe(join(dir, 'tree', 'a', 'y.claim'));
  });

  it('a file is taken as given, whatever its extension, and named as given', async () => {
    const path = file('plain.txt', 'claim: E_4^2 == E_8\n');
    const r = await cli('check', path);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain(`${path}:1`);
  });

  it('binary and non-UTF-8 files are file-level errors (exit 1), with a message and no stack trace', async () => {
    const bin = file('bin.claim', new Uint8Array([0x63, 0x6c, 0x61, 0x69, 0x6d, 0x00, 0x01, 0x0a]));
    const latin = file('latin.claim', new Uint8Array([0x23, 0x20, 0xe9, 0x0a]));
    const r = await cli('check', bin, latin);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('the file looks binary');
    expect(r.stdout).toContain('the file is not UTF-8 text');
    expect(r.stdout + r.stderr).not.toMatch(/\bat .*\.(ts|js):\d+/);
    expect(r.stdout).not.toContain('\u0000');
  });
});

describe('check: options', () => {
  it('--max-terms refuses a claim as an error and checks the rest', async () => {
    const path = file('big.claim', 'claim "big": phi_{0,1}^6 * E_4 == phi_{0,1}^5 * E_4 * phi_{0,1}\nclaim "small": E_4^2 == E_8\n');
    const r = await cli('check', '--max-terms', '50', path);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('more than --max-terms 50');
    expect(r.stdout).toContain('✓ proved    small');
  });

  it('--depth sets how far past the nominal bound a quasi claim is compared', async () => {
    const r = await cli('check', '--depth', '3', `${CASES}/quasi-unproved.claim`);
    expect(r.stdout).toContain('plus 3 q-steps');
  });

  it('--jobs is accepted', async () => {
    const r = await cli('check', '--jobs', '4', ALL_AS_EXPECTED);
    expect(r.code).toBe(0);
  });

  it('--verbose shows types, the compared sides and the bound', async () => {
    const r = await cli('check', '--verbose', `${CASES}/meromorphic-cross-multiplied.claim`);
    expect(r.stdout).toContain('cross-multiplied: left × theta(z)^2, right × phi_{-2,1}');
    expect(r.stdout).toContain('(K + 2m)/12 with K = 1, m = 2: q-order 5/12');
    expect(r.stdout).toMatch(/checked +\d+ coefficients up to q\^\(5\/12\)/);
  });

  it('--output writes the report to a file through a temporary name and prints nothing', async () => {
    const out = join(dir, 'out', 'report.json');
    mkdirSync(join(dir, 'out'), { recursive: true });
    writeFileSync(out, 'old content');
    const r = await cli('check', '--format', 'json', '--output', out, ALL_AS_EXPECTED);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('');
    expect((JSON.parse(readFileSync(out, 'utf8')) as { tool: string }).tool).toBe('sturmcheck');
    expect(readdirSync(join(dir, 'out'))).toEqual(['report.json']);
  });

  it('--output into a missing folder is exit 2', async () => {
    const r = await cli('check', '--output', join(dir, 'nowhere', 'r.txt'), ALL_AS_EXPECTED);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('cannot write');
  });

  it('--help lists --jobs from the option table', async () => {
    const r = await cli('check', '--help');
    expect(r.stdout).toMatch(/--jobs N\s+check claim files in N worker threads; the report keeps file order \(default: number of cores\)/);
  });
});

describe('check: colour', () => {
  it('a terminal gets colour by default', async () => {
    const r = await cliWith(['check', REFUTED], true, {});
    expect(r.stdout).toMatch(ANSI);
  });

  it('NO_COLOR turns it off', async () => {
    const r = await cliWith(['check', REFUTED], true, { NO_COLOR: '1' });
    expect(r.stdout).not.toMatch(ANSI);
  });

  it('--no-color turns it off', async () => {
    const r = await cliWith(['check', '--no-color', REFUTED], true, {});
    expect(r.stdout).not.toMatch(ANSI);
  });

  it('a pipe gets none', async () => {
    const r = await cliWith(['check', REFUTED], false, {});
    expect(r.stdout).not.toMatch(ANSI);
  });
});

describe('check --format json', () => {
  it('is exactly the object of CLAIMS.md', async () => {
    const r = await cli('check', '--format', 'json', `${CASES}/refuted-by-type.claim`, `${CASES}/meromorphic-cross-multiplied.claim`);
    const out = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(Object.keys(out)).toEqual(['tool', 'version', 'claims', 'summary']);
    expect(out['tool']).toBe('sturmcheck');
    expect(out['version']).toMatch(/^\d+\.\d+\.\d+/);
    expect(Object.keys(out['summary'] as object)).toEqual(['proved', 'refuted', 'unproved', 'error', 'asExpected']);
    const allowed = ['file', 'line', 'name', 'verdict', 'expected', 'type', 'leftType', 'rightType', 'compared', 'assumptions', 'bound', 'mismatch', 'reason', 'seconds'];
    const claims = out['claims'] as Record<string, unknown>[];
    for (const c of claims) {
      for (const k of Object.keys(c)) expect(allowed).toContain(k);
      expect(typeof c['seconds']).toBe('number');
      if (c['bound'] !== undefined) expect(Object.keys(c['bound'] as object)).toEqual(['theorem', 'qOrder', 'coefficientsChecked']);
    }
    const byType = claims.find((c) => c['name'] === 'weights differ')!;
    expect(byType['leftType']).toEqual({ weight: '4', index: '0', multiplier: 'trivial', class: 'modular' });
    expect(byType['rightType']).toEqual({ weight: '6', index: '0', multiplier: 'trivial', class: 'modular' });
    const mero = claims.find((c) => c['name'] === 'the same with a wrong constant')!;
    expect(mero['compared']).toBe('cross-multiplied');
    expect(mero['mismatch']).toEqual({ q: '1/4', zeta: ['0'], left: '-18', right: '-33/2' });
    expect(mero).not.toHaveProperty('leftType');
  });
});
