/**
 * `check --format junit`: the JUnit XML format, checked for structure, counts and
 * escaping, and validated with `xmllint --schema` against test/report/junit.xsd (the
 * common testsuites/testsuite/testcase/failure/error/skipped format).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { junitXml } from '../../src/report/index.js';
import type { Verdict } from '../../src/verdict/index.js';
import { PROVED, REFUTED, BY_TYPE, ERROR, UNPROVED, SOURCE } from './fixtures.js';
import { cli } from '../helpers/cli.js';
import { systemTool } from '../helpers/system-tool.js';

const XSD = 'test/report/junit.xsd';
const xmllint = systemTool('xmllint', 'libxml2-utils');

let dir = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'sturmcheck-junit-'));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

const NASTY: Verdict = { ...REFUTED, file: 'y.claim', line: 4, name: 'a <b> & "c" \'d\' \u0001 \uFFFF end', reason: 'x < y & z > w' };

function render(vs: readonly Verdict[]): string {
  return junitXml({ verdicts: vs, sources: new Map([['x.claim', SOURCE]]), toolVersion: '1.2.3' });
}

function count(xml: string, re: RegExp): number {
  return [...xml.matchAll(re)].length;
}

function validate(xml: string, name: string): { status: number | null; output: string } {
  const path = join(dir, name);
  writeFileSync(path, xml);
  const r = spawnSync(xmllint.path ?? 'xmllint', ['--noout', '--nonet', '--schema', XSD, path], { encoding: 'utf8' });
  return { status: r.status, output: `${r.stdout}${r.stderr}` };
}

describe('junit report', () => {
  const all = [PROVED, REFUTED, BY_TYPE, ERROR, UNPROVED, NASTY];

  it('one suite per file and one case per claim, classname the file, the line as an attribute', () => {
    const xml = render(all);
    expect(count(xml, /<testsuite /g)).toBe(2);
    expect(count(xml, /<testcase /g)).toBe(all.length);
    expect(xml).toContain('<testcase classname="x.claim" name="cusp form" file="x.claim" line="2" time="0.012"/>');
  });

  it('counts failures (not as expected) and errors, per suite and in total', () => {
    const xml = render(all);
    expect(xml).toMatch(/<testsuites name="sturmcheck 1\.2\.3" tests="6" failures="2" errors="1" skipped="0" time="[0-9.]+">/);
    expect(xml).toMatch(/<testsuite name="x\.claim" tests="4" failures="1" errors="1" skipped="0"/);
    expect(count(xml, /<failure /g)).toBe(2);
    expect(count(xml, /<error /g)).toBe(1);
  });

  it('a failure carries the verdict, the reason and the first mismatch', () => {
    const xml = render([REFUTED]);
    expect(xml).toContain('<failure message="expected proved, got refuted: a coefficient inside the bound differs (at q^1 ζ^0: left -2, right -288/143)" type="refuted">');
    expect(xml).toContain('verdict: refuted\nexpected: proved\nreason: a coefficient inside the bound differs\nfirst mismatch: at q^1 ζ^0: left -2, right -288/143');
  });

  it('an error carries the diagnostic, quoted from the file', () => {
    const xml = render([ERROR]);
    expect(xml).toContain('<error message="error: the terms of this sum have different types" type="error">');
    expect(xml).toContain('x.claim:3:14: error SC-E003');
  });

  it('escapes markup and replaces characters XML forbids', () => {
    const xml = render([NASTY]);
    expect(xml).toContain('name="a &lt;b&gt; &amp; &quot;c&quot; &apos;d&apos; \uFFFD \uFFFD end"');
    expect(xml).toContain('reason: x &lt; y &amp; z &gt; w');
    expect(xml).not.toMatch(/[\u0000-\u0008]/);
  });

  it.runIf(xmllint.run)('is valid against the JUnit XSD (xmllint), for fixtures and for the bundled claims', async () => {
    const fixtures = validate(render(all), 'fixtures.xml');
    expect(fixtures.status, fixtures.output).toBe(0);
    const r = await cli('check', '--format', 'junit', 'claims', 'test/cases/check/ill-typed-sum.claim');
    expect(r.code).toBe(1);
    const bundled = validate(r.stdout, 'bundled.xml');
    expect(bundled.status, bundled.output).toBe(0);
    expect(r.stdout).toMatch(/<testsuites name="sturmcheck [^"]*" tests="\d+" failures="0" errors="1"/);
  });

  it.runIf(xmllint.run)('the schema rejects a document that breaks it (so the validation means something)', () => {
    const broken = render([PROVED]).replace(' classname="x.claim"', '');
    expect(validate(broken, 'broken.xml').status).not.toBe(0);
  });
});
