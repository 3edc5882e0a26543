/**
 * `check --report FILE.html`: one self-contained page (inline CSS, no script, no
 * network) for a person reading a run on screen or on paper. An overview table lists
 * every claim with its verdict as a mark and a word (never colour alone); then one
 * card per claim: the claim text, the reason, and — when the run recorded the
 * expansions — a coefficient grid: for a refuted claim the left side, the right side
 * and their difference with the first mismatch marked, for a proved claim the
 * bound's derivation and the compared region.
 */
import { asExpected, summarize, type Verdict, type VerdictKind } from '../verdict/index.js';
import { formatDiagnostic } from '../lang/index.js';
import type { Reporter, ReportInput } from './reporter.js';
import { mismatchText } from './mismatch-text.js';
import { typeRecordText } from './type-record-text.js';
import { xmlText } from './xml-text.js';
import { HTML_STYLE } from './html-style.js';
import { gridNote, gridTable } from './coefficient-grid-html.js';
import { routeText } from './route-text.js';

const MARKS: Readonly<Record<VerdictKind, string>> = { proved: '✓', refuted: '✗', unproved: '?', error: '!' };
const ORDER: readonly VerdictKind[] = ['proved', 'refuted', 'unproved', 'error'];

function claimId(i: number): string {
  return `claim-${i + 1}`;
}

function verdictTag(v: Verdict): string {
  return `<span class="tag v-${v.verdict}"><span class="mark">${MARKS[v.verdict]}</span> <span class="word">${v.verdict}</span></span>`;
}

function badges(v: Verdict): string {
  const out: string[] = [];
  if (v.expected !== 'proved') out.push(`<span class="badge expect">expect ${v.expected}</span>`);
  if (!asExpected(v)) out.push('<span class="badge missed">⚠ not as expected</span>');
  return out.join(' ');
}

function fact(term: string, value: string): string {
  return `<dt>${xmlText(term)}</dt><dd>${value}</dd>`;
}

function mono(text: string): string {
  return `<span class="mono">${xmlText(text)}</span>`;
}

function facts(v: Verdict): string {
  const rows: string[] = [];
  if (v.type !== undefined) rows.push(fact('type', xmlText(typeRecordText(v.type))));
  if (v.leftType !== undefined) rows.push(fact('left type', xmlText(typeRecordText(v.leftType))));
  if (v.rightType !== undefined) rows.push(fact('right type', xmlText(typeRecordText(v.rightType))));
  const nf = v.normalForm;
  if (nf !== undefined) {
    const how = nf.compared === 'cross-multiplied' ? `cross-multiplied: left × ${mono(nf.leftMultipliedBy ?? '1')}, right × ${mono(nf.rightMultipliedBy ?? '1')}` : 'the two sides as they are';
    rows.push(fact('compared', how), fact('left of F', mono(nf.left)), fact('right of F', mono(nf.right)));
  }
  if (v.assumptions.length > 0) rows.push(fact('assuming', xmlText(v.assumptions.join(', '))));
  const b = v.bound;
  if (b !== undefined) {
    rows.push(fact('bound', `Theorem ${b.theorem}: ${xmlText(b.derivation)}`));
    rows.push(fact('checked', `${b.coefficientsChecked} coefficient${b.coefficientsChecked === 1 ? '' : 's'} up to q<sup>${xmlText(b.qOrder)}</sup>${b.marginTo === undefined ? '' : `; margin compared up to q<sup>${xmlText(b.marginTo)}</sup>`}`));
  }
  if (b !== undefined || v.mismatch !== undefined) rows.push(fact('route', xmlText(routeText(v))));
  return rows.length === 0 ? '' : `<dl class="facts">${rows.join('')}</dl>`;
}

function grids(v: Verdict): string {
  const e = v.evidence;
  if (e === undefined || e.grid.q.length === 0) return '';
  const g = e.grid;
  if (v.verdict === 'refuted') {
    return `<div class="grids">${gridTable(g, 'left', 'left side of F')}${gridTable(g, 'right', 'right side of F')}${gridTable(g, 'difference', 'difference, left − right')}</div>${gridNote(g, e.coefficients)}`;
  }
  return `<div class="grids">${gridTable(g, 'left', 'compared region: both sides agree')}</div>${gridNote(g, e.coefficients)}`;
}

function diagnostics(v: Verdict, source: string): string {
  const ds = v.diagnostics ?? [];
  return ds.length === 0 ? '' : `<pre class="claim-text diagnostics">${xmlText(ds.map((d) => formatDiagnostic(d, source)).join('\n'))}</pre>`;
}

function card(v: Verdict, i: number, sources: ReadonlyMap<string, string>): string {
  const where = `${v.file}:${v.line}`;
  const name = v.name === where ? '' : `<span class="name">${xmlText(v.name)}</span>`;
  return [
    `<article class="claim v-${v.verdict}${asExpected(v) ? '' : ' missed'}" id="${claimId(i)}" data-verdict="${v.verdict}">`,
    `<h3><span class="mark">${MARKS[v.verdict]}</span><span class="word">${v.verdict}</span>${name}<span class="where">${xmlText(where)}</span>${badges(v)}</h3>`,
    v.claimText === undefined ? '' : `<pre class="claim-text">${xmlText(v.claimText)}</pre>`,
    v.mismatch === undefined ? '' : `<p class="first-mismatch-line">★ First mismatch ${xmlText(mismatchText(v.mismatch))}</p>`,
    v.reason === undefined ? '' : `<p class="reason">${xmlText(v.reason)}</p>`,
    diagnostics(v, sources.get(v.file) ?? ''),
    facts(v),
    grids(v),
    '</article>',
  ].join('\n');
}

function overview(vs: readonly Verdict[]): string {
  const rows = vs.map((v, i) => {
    const label = v.name === `${v.file}:${v.line}` ? `line ${v.line}` : v.name;
    return `<tr${asExpected(v) ? '' : ' class="missed"'}><td class="verdict v-${v.verdict}">${verdictTag(v)}</td><td><a href="#${claimId(i)}">${xmlText(label)}</a></td><td class="mono">${xmlText(`${v.file}:${v.line}`)}</td><td>${asExpected(v) ? 'as expected' : `<span class="badge missed">⚠ expected ${v.expected}</span>`}</td></tr>`;
  });
  return `<table class="overview"><thead><tr><th>verdict</th><th>claim</th><th>place</th><th>expectation</th></tr></thead><tbody>${rows.join('')}</tbody></table>`;
}

function header(input: ReportInput): string {
  const s = summarize(input.verdicts);
  const files = new Set(input.verdicts.map((v) => v.file)).size;
  const missed = input.verdicts.filter((v) => !asExpected(v)).length;
  const counts = ORDER.map((k) => `<li class="v-${k}"><span class="mark">${MARKS[k]}</span> <span class="count">${s[k]}</span>${k}</li>`);
  return [
    '<header class="page">',
    '<h1>sturmcheck report</h1>',
    `<p class="meta">${input.verdicts.length} claims in ${files} file${files === 1 ? '' : 's'} · sturmcheck ${xmlText(input.toolVersion)}</p>`,
    `<ul class="summary">${counts.join('')}</ul>`,
    `<p class="overall${missed === 0 ? '' : ' bad'}">${missed === 0 ? '✓ every claim got its expected verdict' : `⚠ ${missed} claim${missed === 1 ? '' : 's'} not as expected`}</p>`,
    '</header>',
  ].join('\n');
}

function sections(input: ReportInput): string {
  const out: string[] = [];
  let file: string | null = null;
  input.verdicts.forEach((v, i) => {
    if (v.file !== file) {
      file = v.file;
      out.push(`<h2>${xmlText(v.file)}</h2>`);
    }
    out.push(card(v, i, input.sources));
  });
  return out.join('\n');
}

export function htmlReport(input: ReportInput): string {
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<title>sturmcheck report</title>',
    `<style>${HTML_STYLE}</style>`,
    '</head>',
    '<body>',
    header(input),
    '<main>',
    overview(input.verdicts),
    sections(input),
    '</main>',
    '<footer class="page">Marks: ✓ proved, ✗ refuted, ? unproved, ! error. In the grids ★ and a thick border mark the first mismatch (lowest q-exponent, then the ζ-exponent by its norm, then lexicographically); a dashed outline marks any other cell where the sides differ. Exponents are exact rationals.</footer>',
    '</body>',
    '</html>',
    '',
  ].join('\n');
}

export const htmlReporter: Reporter = { render: (input) => htmlReport(input) };
