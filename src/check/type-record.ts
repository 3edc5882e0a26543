/** A type as the verdict record prints it (CLAIMS.md JSON). */
import { rationalToString } from '../series/index.js';
import { type ModularType, type FormClass, multiplierText } from '../types/index.js';
import type { TypeRecord } from '../verdict/index.js';

export function typeRecord(t: ModularType | null, cls: FormClass): TypeRecord {
  if (t === null) return { class: cls };
  const index = t.index.length === 1 ? rationalToString(t.index[0]![0]!) : t.index.map((row) => row.map(rationalToString));
  return { weight: rationalToString(t.weight), index, multiplier: multiplierText(t.etaPower), class: cls };
}
