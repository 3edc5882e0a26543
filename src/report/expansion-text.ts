/**
 * `expand` as text: a header with the type and class, then one line per q-slice of
 * the grid from the lowest exponent to the q-order, zero slices included, every
 * digit shown. Within a slice terms run from the lowest ζ-exponent up.
 */
import { type Rational, rationalToString, rcmp, rat, rneg, sliceExponent, lexCompare } from '../series/index.js';
import { formatIndex, multiplierText } from '../types/index.js';
import type { Expansion } from '../check/expand.js';
import { sliceTerms } from './expansion-terms.js';
import { powerText, zetaExponent } from './exponent-text.js';

function coefficientText(c: Rational, first: boolean, hasMonomial: boolean): string {
  const negative = rcmp(c, rat(0)) < 0;
  const abs = negative ? rneg(c) : c;
  const s = rationalToString(abs);
  const body = hasMonomial ? (s === '1' ? '' : s.includes('/') ? `(${s})` : s) : s;
  if (first) return negative ? `-${body}` : body;
  return negative ? ` - ${body}` : ` + ${body}`;
}


/** ζ^ℓ as text; several variables are written ζ1, ζ2, … in the order declared. */
function zetaMonomial(halves: readonly number[]): string {
  const name = (i: number): string => (halves.length === 1 ? 'ζ' : `ζ${i + 1}`);
  return halves.map((h, i) => (h === 0 ? '' : powerText(name(i), zetaExponent(h)))).join('');
}

/** A Laurent polynomial in ζ, e.g. `ζ^(-1) + 10 + ζ`, terms by increasing exponent. */
export function sliceText(e: Expansion, i: number): string {
  const terms = sliceTerms(e.series, i).sort((a, b) => lexCompare(a.zetaHalves, b.zetaHalves));
  if (terms.length === 0) return '0';
  return terms
    .map((t, k) => {
      const mono = zetaMonomial(t.zetaHalves);
      return coefficientText(t.c, k === 0, mono !== '') + mono;
    })
    .join('');
}

export function expansionHeader(expression: string, e: Expansion): string[] {
  const lines = [`expression  ${expression}`];
  if (e.type !== null) {
    lines.push(
      `type        weight ${rationalToString(e.type.weight)}, index ${formatIndex(e.type.index)}, multiplier ${multiplierText(e.type.etaPower)}`,
    );
  }
  lines.push(`class       ${e.cls}${e.quasiReasons.length > 0 ? ` (${e.quasiReasons.join('; ')})` : ''}`);
  if (e.denominator !== null) lines.push(`denominator ${e.denominator}   (the slices below are the numerator's)`);
  lines.push(`q-order     ${rationalToString(e.qOrder)}`);
  return lines;
}

export function expansionText(expression: string, e: Expansion): string {
  const rows: [string, string][] = [];
  const s = e.series;
  for (let i = 0; i < s.slices.length; i++) rows.push([powerText('q', sliceExponent(s, i), false), sliceText(e, i)]);
  // Leading zero slices before the first non-zero one carry no information.
  while (rows.length > 0 && rows[0]![1] === '0') rows.shift();
  if (rows.length === 0) return [...expansionHeader(expression, e), '', `0  (every coefficient up to q^${rationalToString(e.qOrder)} vanishes)`].join('\n') + '\n';
  const width = Math.max(0, ...rows.map((r) => r[0].length));
  return [...expansionHeader(expression, e), '', ...rows.map(([q, t]) => `${q.padEnd(width)}  ${t}`)].join('\n') + '\n';
}
