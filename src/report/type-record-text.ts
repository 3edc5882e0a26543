/** A verdict's type record as one line: "weight -2, index 1, multiplier trivial (modular)". */
import type { TypeRecord } from '../verdict/index.js';

function indexText(index: string | string[][]): string {
  return typeof index === 'string' ? index : `[${index.map((row) => `[${row.join(', ')}]`).join(', ')}]`;
}

export function typeRecordText(t: TypeRecord): string {
  if (t.weight === undefined || t.index === undefined) return `no type (${t.class})`;
  return `weight ${t.weight}, index ${indexText(t.index)}, multiplier ${t.multiplier ?? 'trivial'} (${t.class})`;
}
