/**
 * The window of compared coefficients the HTML report shows (verdict/coefficient-grid):
 * at most GRID_ROWS q-exponents and GRID_COLUMNS ζ-columns, chosen around the first
 * mismatch when there is one (so it is always on the page), else from the start of
 * the compared region. Small on purpose: a reader compares a handful of numbers by
 * eye; the page says how much was left out.
 */
import { type Rational, rat, rcmp, rsub, rationalToString, vectorKey, lexCompare } from '../series/index.js';
import type { CoefficientGrid } from '../verdict/index.js';
import type { Mismatch, ZetaNorm } from './compare-series.js';
import type { ComparedCell, ComparedRow } from './compared-positions.js';

export const GRID_ROWS = 8;
/** One variable: a run of exponents around the centre reads well up to about this many. */
export const GRID_COLUMNS = 13;
/** Several variables: each column is a vector, wider to print. */
export const GRID_COLUMNS_SEVERAL = 9;


function rowWindow(rows: readonly ComparedRow[], mismatch: Mismatch | null): readonly ComparedRow[] {
  if (mismatch === null || rows.length <= GRID_ROWS) return rows.slice(0, GRID_ROWS);
  const mi = rows.findIndex((r) => rcmp(r.q, mismatch.q) === 0);
  // Keep a few agreeing rows before the mismatch and up to two after it.
  const start = Math.max(0, Math.min(mi - (GRID_ROWS - 3), rows.length - GRID_ROWS));
  return rows.slice(start, start + GRID_ROWS);
}

function chooseColumns(all: readonly (readonly number[])[], mismatch: Mismatch | null, norm: ZetaNorm): (readonly number[])[] {
  if (all.length > 0 && all[0]!.length === 1) {
    const centre = mismatch?.zetaHalves[0] ?? 0;
    const near = [...all].sort((x, y) => Math.abs(x[0]! - centre) - Math.abs(y[0]! - centre) || x[0]! - y[0]!);
    return near.slice(0, GRID_COLUMNS).sort((x, y) => x[0]! - y[0]!);
  }
  const ordered = [...all].sort((x, y) => norm(x) - norm(y) || lexCompare(x, y));
  const kept = ordered.slice(0, GRID_COLUMNS_SEVERAL);
  if (mismatch !== null && !kept.some((e) => lexCompare(e, mismatch.zetaHalves) === 0)) {
    kept[kept.length - 1] = mismatch.zetaHalves;
  }
  return kept;
}

function distinctColumns(rows: readonly ComparedRow[]): (readonly number[])[] {
  const seen = new Map<string, readonly number[]>();
  for (const r of rows) for (const c of r.cells) seen.set(vectorKey(c.halves), c.halves);
  return [...seen.values()];
}

const ZERO_CELL = { left: rat(0), right: rat(0) };

export function coefficientGrid(rows: readonly ComparedRow[], mismatch: Mismatch | null, norm: ZetaNorm): CoefficientGrid {
  const shown = rowWindow(rows, mismatch);
  const columns = chooseColumns(distinctColumns(shown), mismatch, norm);
  const table = (pick: (c: { left: Rational; right: Rational }) => Rational): string[][] =>
    shown.map((r) => {
      const byKey = new Map<string, ComparedCell>(r.cells.map((c) => [vectorKey(c.halves), c]));
      return columns.map((e) => rationalToString(pick(byKey.get(vectorKey(e)) ?? ZERO_CELL)));
    });
  const row = mismatch === null ? -1 : shown.findIndex((r) => rcmp(r.q, mismatch.q) === 0);
  const column = mismatch === null ? -1 : columns.findIndex((e) => lexCompare(e, mismatch.zetaHalves) === 0);
  const difference = table((c) => rsub(c.left, c.right));
  return {
    q: shown.map((r) => rationalToString(r.q)),
    zeta: columns.map((e) => e.map((h) => rationalToString(rat(h, 2)))),
    left: table((c) => c.left),
    right: table((c) => c.right),
    difference,
    ...(row >= 0 && column >= 0 ? { firstMismatch: { row, column } } : {}),
    rowsTotal: rows.length,
    columnsTotal: distinctColumns(rows).length,
  };
}
