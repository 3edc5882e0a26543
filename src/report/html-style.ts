/**
 * The stylesheet of the HTML report, inlined so the page is one self-contained file
 * (no network, no fonts to fetch). Verdicts are told apart by a text mark and a word
 * first; colour only repeats them. The print rules drop colour fills, keep borders
 * and the marks, and keep each claim on one page where it fits.
 */
export const HTML_STYLE = `
:root {
  --ink: #1f2328; --faint: #59636e; --rule: #d1d9e0; --paper: #ffffff; --panel: #f6f8fa;
  --proved: #1a7f37; --refuted: #c4232c; --unproved: #8a5a00; --error: #7a3fc8;
  --proved-bg: #e9f7ee; --refuted-bg: #fdecec; --unproved-bg: #fdf4e0; --error-bg: #f3ecfc;
}
* { box-sizing: border-box; }
body { margin: 0; background: var(--panel); color: var(--ink);
  font: 15px/1.5 system-ui, -apple-system, "Segoe UI", "DejaVu Sans", sans-serif; }
main, header.page { max-width: 1120px; margin: 0 auto; padding: 0 24px; }
header.page { padding-top: 28px; padding-bottom: 8px; }
h1 { font-size: 26px; margin: 0 0 4px; letter-spacing: -0.01em; }
h2 { font-size: 18px; margin: 32px 0 12px; padding-bottom: 6px; border-bottom: 2px solid var(--rule);
  font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-weight: 600; }
.meta { color: var(--faint); margin: 0 0 16px; }
code, pre, .mono { font-family: ui-monospace, "DejaVu Sans Mono", Menlo, monospace; font-size: 13px; }
.summary { display: flex; flex-wrap: wrap; gap: 10px; list-style: none; padding: 0; margin: 0 0 8px; }
.summary li { background: var(--paper); border: 1px solid var(--rule); border-radius: 8px; padding: 8px 14px; font-weight: 600; }
.summary .count { font-size: 22px; margin-right: 6px; }
.overall { font-weight: 600; margin: 8px 0 20px; }
.overall.bad { color: var(--refuted); }
.mark { display: inline-block; min-width: 1.2em; text-align: center; font-weight: 700; }
.v-proved .mark, .v-proved.tag { color: var(--proved); }
.v-refuted .mark, .v-refuted.tag { color: var(--refuted); }
.v-unproved .mark, .v-unproved.tag { color: var(--unproved); }
.v-error .mark, .v-error.tag { color: var(--error); }
table.overview { width: 100%; border-collapse: collapse; background: var(--paper); border: 1px solid var(--rule); border-radius: 8px; overflow: hidden; }
table.overview th, table.overview td { text-align: left; padding: 5px 10px; border-bottom: 1px solid var(--rule); vertical-align: top; }
table.overview th { background: var(--panel); font-size: 13px; color: var(--faint); font-weight: 600; }
table.overview td.verdict { white-space: nowrap; font-weight: 600; }
table.overview a { color: inherit; }
tr.missed td { background: var(--refuted-bg); }
.badge { display: inline-block; white-space: nowrap; border: 1.5px solid currentColor; border-radius: 4px; padding: 0 6px; font-size: 12px; font-weight: 700; letter-spacing: 0.02em; }
.badge.missed { color: var(--refuted); background: var(--refuted-bg); }
.badge.expect { color: var(--faint); }
article.claim { background: var(--paper); border: 1px solid var(--rule); border-left: 6px solid var(--rule); border-radius: 8px; padding: 14px 18px; margin: 0 0 14px; }
article.v-proved { border-left-color: var(--proved); }
article.v-refuted { border-left-color: var(--refuted); }
article.v-unproved { border-left-color: var(--unproved); }
article.v-error { border-left-color: var(--error); }
article.claim h3 { margin: 0 0 6px; font-size: 16px; display: flex; flex-wrap: wrap; gap: 8px; align-items: baseline; }
article.claim h3 .word { text-transform: uppercase; font-size: 13px; letter-spacing: 0.06em; }
article.claim h3 .where { color: var(--faint); font-weight: 400; font-size: 13px; }
pre.claim-text { background: var(--panel); border: 1px solid var(--rule); border-radius: 6px; padding: 8px 10px; margin: 8px 0; white-space: pre-wrap; overflow-wrap: anywhere; }
dl.facts { display: grid; grid-template-columns: max-content 1fr; gap: 2px 14px; margin: 8px 0; }
dl.facts dt { color: var(--faint); }
dl.facts dd { margin: 0; overflow-wrap: anywhere; }
p.reason { margin: 6px 0; }
p.first-mismatch-line { margin: 6px 0; font-weight: 600; }
.grids { display: flex; flex-wrap: wrap; gap: 16px; margin: 10px 0 4px; }
figure.grid { margin: 0; max-width: 100%; overflow-x: auto; }
figure.grid figcaption { font-size: 13px; font-weight: 600; margin-bottom: 4px; }
table.coefficients { border-collapse: collapse; font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-size: 12.5px; }
table.coefficients th, table.coefficients td { border: 1px solid var(--rule); padding: 3px 7px; text-align: right; white-space: nowrap; }
table.coefficients th { background: var(--panel); font-weight: 600; }
table.coefficients td.zero { color: #8c959f; }
table.coefficients td.differs { outline: 1px dashed var(--refuted); outline-offset: -3px; }
table.coefficients td.first-mismatch { border: 3px solid var(--refuted); background: var(--refuted-bg); font-weight: 700; }
table.coefficients td.first-mismatch::before { content: "\\2605\\00a0"; color: var(--refuted); }
p.grid-note { color: var(--faint); font-size: 13px; margin: 4px 0 0; }
footer.page { max-width: 1120px; margin: 24px auto 40px; padding: 0 24px; color: var(--faint); font-size: 13px; }
@media print {
  body { background: #fff; color: #000; font-size: 10pt; }
  main, header.page, footer.page { max-width: none; padding: 0; }
  article.claim { border: 1px solid #000; border-left-width: 4px; break-inside: avoid; page-break-inside: avoid; }
  article.v-proved, article.v-refuted, article.v-unproved, article.v-error { border-left-color: #000; }
  article.v-refuted, article.v-error { border-left-style: double; border-left-width: 6px; }
  .summary li, table.overview, pre.claim-text { border-color: #000; background: #fff; }
  tr.missed td, .badge.missed, table.coefficients td.first-mismatch { background: #fff; }
  .badge, .mark, .tag, table.coefficients td.first-mismatch::before { color: #000 !important; }
  table.coefficients { font-size: 7.5pt; }
  table.coefficients th, table.coefficients td { border-color: #555; padding: 1px 3px; }
  figure.grid { overflow: visible; }
  table.coefficients td.first-mismatch { border: 3px solid #000; }
  table.coefficients td.differs { outline-color: #000; }
  a { color: #000; text-decoration: none; }
  h2 { break-after: avoid; page-break-after: avoid; }
}
`;
