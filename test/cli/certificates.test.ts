/**
 * `check --certificates DIR` and `recheck CERT.json` end to end (in-process): every
 * certificate written is valid against grammar/certificate.schema.json and is
 * confirmed by `recheck`; tampering gives exit 1, an unusable file exit 2; writes
 * are atomic and DIR is created.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { cli } from '../helpers/cli.js';
import { validateJson } from '../helpers/json-schema.js';

const SCHEMA = JSON.parse(readFileSync('grammar/certificate.schema.json', 'utf8')) as Record<string, unknown>;
const EXAMPLE = 'test/cases/check/example-from-claims-md.claim';

let dir = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'sturmcheck-certs-'));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

function readJson(path: string): Record<string, any> {
  return JSON.parse(readFileSync(path, 'utf8')) as Record<string, any>;
}

describe('check --certificates', () => {
  it('writes one valid certificate per proved claim of the bundled collection, each confirmed by recheck', async () => {
    const out = join(dir, 'bundled', 'nested');
    const r = await cli('check', '--certificates', out, 'claims');
    expect(r.code).toBe(0);
    const json = await cli('check', '--format', 'json', 'claims');
    const proved = (JSON.parse(json.stdout) as { summary: { proved: number } }).summary.proved;
    const files = readdirSync(out).sort();
    expect(files).toHaveLength(proved);
    for (const f of files) {
      expect(f).toMatch(/^[a-z0-9-]+--[a-z0-9-]+\.json$/);
      expect(validateJson(SCHEMA, readJson(join(out, f))), f).toEqual([]);
    }
    // recheck re-derives every one from its claim and closure alone.
    for (const f of files) {
      const again = await cli('recheck', join(out, f));
      expect(again.code, `${f}: ${again.stdout}${again.stderr}`).toBe(0);
      expect(again.stdout).toMatch(/^confirmed /);
    }
  }, 120_000);

  it('the schema validation has teeth: broken certificates are rejected', async () => {
    const out = join(dir, 'teeth');
    await cli('check', '--certificates', out, EXAMPLE);
    const good = readJson(join(out, 'example-from-claims-md--a-is-the-weak-generator-of-weight-2.json'));
    const broken = (edit: (c: Record<string, any>) => void): string[] => {
      const c = JSON.parse(JSON.stringify(good)) as Record<string, any>;
      edit(c);
      return validateJson(SCHEMA, c);
    };
    expect(validateJson(SCHEMA, good)).toEqual([]);
    expect(broken((c) => delete c['route'])).toEqual(['$: missing route']);
    expect(broken((c) => (c['extra'] = 1))).toEqual(['$: unexpected property extra']);
    expect(broken((c) => (c['bound']['qOrder'] = '2/4x'))).toHaveLength(1);
    expect(broken((c) => delete c['comparison'])).toEqual(['$: bound needs comparison']);
    expect(broken((c) => (c['normalForm']['left']['factors'][0]['exponent'] = 1.5))).toHaveLength(1);
  });

  it('names files after the file and the claim, stably across runs', async () => {
    const a = join(dir, 'a');
    const b = join(dir, 'b');
    await cli('check', '--certificates', a, EXAMPLE);
    await cli('check', '--certificates', b, EXAMPLE);
    const names = readdirSync(a).sort();
    expect(names).toEqual([
      'example-from-claims-md--a-is-the-weak-generator-of-weight-2.json',
      'example-from-claims-md--b-has-the-expected-type.json',
      'example-from-claims-md--eisenstein-form-of-the-weight-10-cusp-form.json',
    ]);
    expect(readdirSync(b).sort()).toEqual(names);
    for (const n of names) expect(readFileSync(join(b, n), 'utf8')).toBe(readFileSync(join(a, n), 'utf8'));
  });

  it('records the bound\'s derivation, the route, the count and the digest', async () => {
    const out = join(dir, 'fields');
    await cli('check', '--certificates', out, EXAMPLE);
    const c = readJson(join(out, 'example-from-claims-md--eisenstein-form-of-the-weight-10-cusp-form.json'));
    // Weight 10, index 1: (K + 2m)/12 = (10 + 2)/12 = 1 (Theorem A, MATH.md §6).
    expect(c['bound']).toMatchObject({ theorem: 'A', weight: '10', index: '1', qOrder: '1' });
    expect(c['route']).toEqual({ route: 'exact' });
    // Δ·φ_{-2,1} = q(ζ^-1 − 2 + ζ) + O(q²) (Eichler–Zagier, The Theory of Jacobi Forms, Theorem 9.3,
    // with Δ = q + O(q²)): up to q^1 exactly three positions are non-zero.
    expect(c['comparison']['coefficients']).toBe(3);
    expect(c['comparison']['digest']['value']).toMatch(/^[0-9a-f]{64}$/);
    expect(c['claim']['text']).toContain('Delta * phi_{-2,1} == (E_6 * E_{4,1} - E_4 * E_{6,1}) / 144');
  });

  it('replaces an existing certificate only by a complete one and leaves no temporary file', async () => {
    const out = join(dir, 'replace');
    mkdirSync(out, { recursive: true });
    const name = 'example-from-claims-md--b-has-the-expected-type.json';
    writeFileSync(join(out, name), 'old');
    writeFileSync(join(out, 'notes.txt'), 'kept');
    expect((await cli('check', '--certificates', out, EXAMPLE)).code).toBe(0);
    expect(readJson(join(out, name))['format']).toBe('sturmcheck-certificate');
    expect(readdirSync(out).filter((f) => f.endsWith('.tmp'))).toEqual([]);
    expect(readFileSync(join(out, 'notes.txt'), 'utf8')).toBe('kept');
  });

  it('is exit 2 when DIR cannot be created (a file is in the way), and the report is still printed', async () => {
    const blocker = join(dir, 'blocker');
    writeFileSync(blocker, 'a file');
    const r = await cli('check', '--certificates', join(blocker, 'sub'), EXAMPLE);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('cannot create');
    expect(r.stdout).toContain('all as expected');
  });
});

describe('recheck', () => {
  async function certificate(): Promise<string> {
    const out = join(dir, 'recheck-src');
    await cli('check', '--certificates', out, EXAMPLE);
    return join(out, 'example-from-claims-md--a-is-the-weak-generator-of-weight-2.json');
  }

  function tampered(path: string, name: string, edit: (c: Record<string, any>) => void): string {
    const c = readJson(path);
    edit(c);
    const to = join(dir, `${name}.json`);
    writeFileSync(to, JSON.stringify(c, null, 2));
    return to;
  }

  it('0 and "confirmed" for an untouched certificate', async () => {
    const r = await cli('recheck', await certificate());
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('confirmed  A is the weak generator of weight -2');
    // φ_{-2,1} = ζ^-1 − 2 + ζ + O(q) (Eichler–Zagier, Theorem 9.3): three positions up to q^0.
    expect(r.stdout).toContain('3 coefficients up to q-order 0');
  });

  it.each([
    ['a lowered bound', 'bound', (c: Record<string, any>) => (c['bound']['qOrder'] = '-1/12')],
    ['a changed digest', 'digest', (c: Record<string, any>) => (c['comparison']['digest']['value'] = 'f'.repeat(64))],
    ['a cut coefficient count', 'coefficient count', (c: Record<string, any>) => (c['comparison']['coefficients'] = 1)],
    ['claim text edited without the hash', 'claim hash', (c: Record<string, any>) => (c['claim']['text'] = c['claim']['text'].replace('phi_{-2,1}', 'phi_{0,1}'))],
  ])('1 for %s, naming the step', async (what, step, edit) => {
    const r = await cli('recheck', tampered(await certificate(), what.replace(/ /g, '-'), edit));
    expect(r.code).toBe(1);
    expect(r.stdout).toContain(`step '${step}' disagrees`);
  });

  it.each([
    ['not JSON', '{"format": '],
    ['wrong shape', '{"format": "sturmcheck-certificate"}'],
    ['not UTF-8', Buffer.from([0x7b, 0xff, 0x7d])],
  ])('2 for a file that is %s', async (what, content) => {
    const path = join(dir, `unusable-${what.replace(/ /g, '-')}.json`);
    writeFileSync(path, content);
    const r = await cli('recheck', path);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('is unusable');
  });

  it('2 for a missing file and for a wrong number of arguments', async () => {
    expect((await cli('recheck', join(dir, 'none.json'))).code).toBe(2);
    expect((await cli('recheck')).code).toBe(2);
    expect(existsSync(join(dir, 'none.json'))).toBe(false);
  });
});
