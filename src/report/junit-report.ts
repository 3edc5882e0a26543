/**
 * `check --format junit`: the JUnit XML format CI systems read — `<testsuites>` with
 * one `<testsuite>` per claim file and one `<testcase>` per claim (classname = the
 * file, name = the claim's name, `file` and `line` attributes for the place). A claim
 * that missed its expected verdict is a `<failure>`, an `error` verdict an `<error>`;
 * both carry the verdict, the reason and the first mismatch. `tests`, `failures`,
 * `errors` and `skipped` are counted per suite and in total; times are in seconds.
 */
import { asExpected, type Verdict } from '../verdict/index.js';
import { formatDiagnostic } from '../lang/index.js';
import type { Reporter, ReportInput } from './reporter.js';
import { mismatchText } from './mismatch-text.js';
import { xmlText } from './xml-text.js';

interface Counts {
  tests: number;
  failures: number;
  errors: number;
  time: number;
}

function seconds(s: number): string {
  return s.toFixed(3);
}

function counts(vs: readonly Verdict[]): Counts {
  return {
    tests: vs.length,
    failures: vs.filter((v) => v.verdict !== 'error' && !asExpected(v)).length,
    errors: vs.filter((v) => v.verdict === 'error').length,
    time: vs.reduce((t, v) => t + v.seconds, 0),
  };
}

function countAttributes(c: Counts): string {
  return `tests="${c.tests}" failures="${c.failures}" errors="${c.errors}" skipped="0" time="${seconds(c.time)}"`;
}

/** The body of a failure or error: what a reader of the CI log needs to act on. */
function details(v: Verdict, source: string): string {
  const lines = [`verdict: ${v.verdict}`, `expected: ${v.expected}`];
  if (v.reason !== undefined) lines.push(`reason: ${v.reason}`);
  if (v.mismatch !== undefined) lines.push(`first mismatch: ${mismatchText(v.mismatch)}`);
  for (const d of v.diagnostics ?? []) lines.push(formatDiagnostic(d, source));
  if (v.claimText !== undefined) lines.push(`claim: ${v.claimText}`);
  return lines.join('\n');
}

function testcase(v: Verdict, sources: ReadonlyMap<string, string>): string {
  const head = `    <testcase classname="${xmlText(v.file)}" name="${xmlText(v.name)}" file="${xmlText(v.file)}" line="${v.line}" time="${seconds(v.seconds)}"`;
  if (asExpected(v)) return `${head}/>`;
  const element = v.verdict === 'error' ? 'error' : 'failure';
  const summary = v.verdict === 'error' ? `error: ${v.reason ?? 'the claim could not be checked'}` : `expected ${v.expected}, got ${v.verdict}${v.reason === undefined ? '' : `: ${v.reason}`}`;
  const message = v.mismatch === undefined ? summary : `${summary} (${mismatchText(v.mismatch)})`;
  return [
    `${head}>`,
    `      <${element} message="${xmlText(message)}" type="${v.verdict}">${xmlText(details(v, sources.get(v.file) ?? ''))}</${element}>`,
    '    </testcase>',
  ].join('\n');
}

/** Verdicts grouped by file, files in the order first seen (the order checked). */
function byFile(vs: readonly Verdict[]): Map<string, Verdict[]> {
  const groups = new Map<string, Verdict[]>();
  for (const v of vs) {
    const g = groups.get(v.file);
    if (g === undefined) groups.set(v.file, [v]);
    else g.push(v);
  }
  return groups;
}

export function junitXml(input: ReportInput): string {
  const lines = ['<?xml version="1.0" encoding="UTF-8"?>', `<testsuites name="sturmcheck ${xmlText(input.toolVersion)}" ${countAttributes(counts(input.verdicts))}>`];
  for (const [file, vs] of byFile(input.verdicts)) {
    lines.push(`  <testsuite name="${xmlText(file)}" ${countAttributes(counts(vs))}>`);
    for (const v of vs) lines.push(testcase(v, input.sources));
    lines.push('  </testsuite>');
  }
  lines.push('</testsuites>');
  return `${lines.join('\n')}\n`;
}

export const junitReporter: Reporter = { render: (input) => junitXml(input) };
