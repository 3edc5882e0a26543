/**
 * `check` as text for a person at a terminal: one line per claim whose mark spells
 * the verdict out (`✓ proved`, `✗ refuted`, `? unproved`, `! error`), so nothing
 * depends on colour; under it what a reader needs to act on (the first mismatch,
 * the diagnostic, the reason); `--verbose` adds how the verdict was reached. A
 * summary line closes the report.
 */
import { asExpected, summarize, type Verdict, type VerdictKind } from '../verdict/index.js';
import { formatDiagnostic } from '../lang/index.js';
import type { Reporter, ReportInput, ReportStyle } from './reporter.js';
import { palette, type Palette, type Paint } from './palette.js';
import { mismatchText, exponentText } from './mismatch-text.js';
import { typeRecordText } from './type-record-text.js';
import { terminalSafe } from './terminal-safe.js';
import { routeText } from './route-text.js';

const MARKS: Readonly<Record<VerdictKind, string>> = {
  proved: '✓ proved',
  refuted: '✗ refuted',
  unproved: '? unproved',
  error: '! error',
};

/** Wide enough for the longest mark, so that claim names line up. */
const MARK_WIDTH = Math.max(...Object.values(MARKS).map((m) => m.length)) + 2;
const INDENT = '    ';

function markPaint(v: Verdict, p: Palette): Paint {
  if (asExpected(v)) return p.good;
  return v.verdict === 'unproved' ? p.doubt : p.bad;
}

function headLine(v: Verdict, p: Palette): string {
  const assuming = v.verdict === 'proved' && v.assumptions.length > 0 ? `, assuming ${terminalSafe(v.assumptions.join(', '))}` : '';
  const mark = `${MARKS[v.verdict]}${assuming}`;
  const expectation = v.expected === 'proved' ? '' : `  ${p.faint(`[expect ${v.expected}]`)}`;
  const miss = asExpected(v) || v.expected === 'proved' ? '' : `  ${p.bad('not as expected')}`;
  const where = `${v.file}:${v.line}`;
  // An unnamed claim (or a file-level error) is named by its place already.
  const label = v.name === where ? p.strong(terminalSafe(where)) : `${p.strong(terminalSafe(v.name))}  ${p.faint(`(${terminalSafe(where)})`)}`;
  return `${markPaint(v, p)(mark.length < MARK_WIDTH ? mark.padEnd(MARK_WIDTH) : `${mark}  `)}${label}${expectation}${miss}`;
}

/** Every text that may come from the claim file passes here, so it is masked here. */
function indent(text: string): string[] {
  return terminalSafe(text).split('\n').map((l) => INDENT + l);
}

/** The diagnostics of an error, quoted from the file, or its reason when it has none. */
function errorLines(v: Verdict, sources: ReadonlyMap<string, string>): string[] {
  const ds = v.diagnostics ?? [];
  const text = sources.get(v.file) ?? '';
  const lines: string[] = [];
  // A failed definition's reason names the definition; its diagnostic does not.
  if (v.reason !== undefined && !ds.some((d) => d.message === v.reason)) lines.push(...indent(v.reason));
  for (const d of ds) lines.push(...indent(formatDiagnostic(d, text)));
  return lines;
}

function plainLines(v: Verdict): string[] {
  const lines: string[] = [];
  if (v.mismatch !== undefined) lines.push(...indent(mismatchText(v.mismatch)));
  if (v.reason !== undefined) lines.push(...indent(v.reason));
  return lines;
}

function qPower(x: string): string {
  return exponentText('q', x);
}

function verboseLines(v: Verdict, p: Palette): string[] {
  const rows: [string, string][] = [];
  if (v.type !== undefined) rows.push(['type', typeRecordText(v.type)]);
  if (v.leftType !== undefined) rows.push(['left type', typeRecordText(v.leftType)]);
  if (v.rightType !== undefined) rows.push(['right type', typeRecordText(v.rightType)]);
  const nf = v.normalForm;
  if (nf !== undefined) {
    if (nf.compared === 'cross-multiplied') {
      rows.push(['compared', `cross-multiplied: left × ${nf.leftMultipliedBy ?? '1'}, right × ${nf.rightMultipliedBy ?? '1'}`]);
    } else rows.push(['compared', 'the two sides as they are']);
    rows.push(['left', nf.left], ['right', nf.right], ['F type', typeRecordText(nf.type)]);
  }
  const b = v.bound;
  if (b !== undefined) {
    rows.push(['bound', b.derivation]);
    const margin = b.marginTo === undefined ? '' : `; margin compared up to ${qPower(b.marginTo)}`;
    rows.push(['checked', `${b.coefficientsChecked} coefficients up to ${qPower(b.qOrder)}${margin}`]);
  }
  if (b !== undefined || v.mismatch !== undefined) rows.push(['route', routeText(v)]);
  if (v.assumptions.length > 0) rows.push(['assumptions', v.assumptions.join(', ')]);
  rows.push(['time', `${v.seconds.toFixed(3)} s`]);
  return rows.map(([k, t]) => `${INDENT}${p.faint(k.padEnd(12))}${terminalSafe(t)}`);
}

function claimLines(v: Verdict, sources: ReadonlyMap<string, string>, style: ReportStyle, p: Palette): string[] {
  const lines = [headLine(v, p)];
  lines.push(...(v.verdict === 'error' ? errorLines(v, sources) : plainLines(v)));
  if (style.verbose && v.verdict !== 'error') lines.push(...verboseLines(v, p));
  return lines;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

export function summaryLine(vs: readonly Verdict[], p: Palette): string {
  const s = summarize(vs);
  const counts = `${plural(vs.length, 'claim')}: ${s.proved} proved, ${s.refuted} refuted, ${s.unproved} unproved, ${plural(s.error, 'error')}`;
  const missed = vs.filter((v) => !asExpected(v)).length;
  return `${counts}; ${missed === 0 ? p.good('all as expected') : p.bad(`${missed} not as expected`)}`;
}

export const terminalReporter: Reporter = {
  render: (input: ReportInput, style: ReportStyle) => {
    const p = palette(style.color);
    const lines = input.verdicts.flatMap((v) => claimLines(v, input.sources, style, p));
    return [...lines, '', summaryLine(input.verdicts, p)].join('\n') + '\n';
  },
};
