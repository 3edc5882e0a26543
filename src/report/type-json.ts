/** A type as the JSON object of CLAIMS.md: strings for rationals, matrices as arrays. */
import { rationalToString } from '../series/index.js';
import { type ModularType, type FormClass, multiplierText } from '../types/index.js';

export interface TypeJson {
  weight?: string;
  index?: string | string[][];
  multiplier?: string;
  class: FormClass;
}

export function typeJson(t: ModularType | null, cls: FormClass): TypeJson {
  if (t === null) return { class: cls };
  const index = t.index.length === 1 ? rationalToString(t.index[0]![0]!) : t.index.map((row) => row.map(rationalToString));
  return { weight: rationalToString(t.weight), index, multiplier: multiplierText(t.etaPower), class: cls };
}
