/**
 * A coefficient grid (verdict/coefficient-grid) as HTML tables: rows q-exponents,
 * columns ζ-exponents (one variable) or ζ-vectors (several). The first mismatch is
 * marked three ways that survive print and colour blindness: a ★ before the value, a
 * thick border, and `data-first-mismatch` for tools; other differing cells get a
 * dashed outline.
 */
import type { CoefficientGrid } from '../verdict/index.js';
import { xmlText } from './xml-text.js';

export type GridPart = 'left' | 'right' | 'difference';

function power(base: string, e: string): string {
  return `${base}<sup>${xmlText(e)}</sup>`;
}

function columnHeader(zeta: readonly string[]): string {
  return zeta.length === 1 ? power('ζ', zeta[0]!) : `(${zeta.map(xmlText).join(', ')})`;
}

function cell(g: CoefficientGrid, part: GridPart, row: number, column: number): string {
  const value = g[part][row]![column]!;
  const differs = g.difference[row]![column]! !== '0';
  const first = g.firstMismatch !== undefined && g.firstMismatch.row === row && g.firstMismatch.column === column;
  const classes = [value === '0' ? 'zero' : '', first ? 'first-mismatch' : differs ? 'differs' : ''].filter((c) => c !== '').join(' ');
  const attributes = `${classes === '' ? '' : ` class="${classes}"`}${first ? ' data-first-mismatch="true" title="first mismatch"' : ''}`;
  return `<td${attributes}>${xmlText(value)}</td>`;
}

export function gridTable(g: CoefficientGrid, part: GridPart, caption: string): string {
  const several = g.zeta.length > 0 && g.zeta[0]!.length > 1;
  const corner = several ? 'q \\ (ℓ<sub>1</sub>, …)' : 'q \\ ζ';
  const head = `<tr><th scope="col">${corner}</th>${g.zeta.map((z) => `<th scope="col">${columnHeader(z)}</th>`).join('')}</tr>`;
  const body = g.q.map((q, r) => `<tr><th scope="row">${power('q', q)}</th>${g.zeta.map((_, c) => cell(g, part, r, c)).join('')}</tr>`);
  return [
    `<figure class="grid grid-${part}">`,
    `<figcaption>${xmlText(caption)}</figcaption>`,
    `<table class="coefficients" data-part="${part}">`,
    `<thead>${head}</thead>`,
    `<tbody>${body.join('')}</tbody>`,
    '</table>',
    '</figure>',
  ].join('');
}

function counted(shown: number, total: number, one: string, many: string): string {
  if (shown < total) return `${shown} of ${total} ${many}`;
  return total === 1 ? `the only ${one}` : `all ${total} ${many}`;
}

/** What the window leaves out, said on the page (the grid is capped on purpose). */
export function gridNote(g: CoefficientGrid, compared: number | undefined): string {
  const several = g.zeta.length > 0 && g.zeta[0]!.length > 1;
  const rows = counted(g.q.length, g.rowsTotal, 'q-exponent', 'q-exponents');
  const cols = counted(g.zeta.length, g.columnsTotal, several ? 'ζ-exponent vector' : 'ζ-exponent', several ? 'ζ-exponent vectors' : 'ζ-exponents');
  const total = compared === undefined ? '' : `; ${compared} coefficient${compared === 1 ? ' was' : 's were'} compared in all`;
  const capped = g.q.length < g.rowsTotal || g.zeta.length < g.columnsTotal ? ' (the window is capped to stay readable)' : '';
  return `<p class="grid-note">Showing ${rows} with a non-zero coefficient and ${cols}${capped}${total}.</p>`;
}
