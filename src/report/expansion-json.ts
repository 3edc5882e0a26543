/** `expand --format json` (CLAIMS.md). */
import { rationalToString } from '../series/index.js';
import type { Expansion } from '../check/expand.js';
import { typeJson, type TypeJson } from './type-json.js';
import { expansionTerms } from './expansion-terms.js';
import { zetaExponent } from './exponent-text.js';

export interface ExpansionJson {
  expression: string;
  type: TypeJson;
  qOrder: string;
  denominator?: string;
  terms: { q: string; zeta: string[]; c: string }[];
}

export function expansionJson(expression: string, e: Expansion): ExpansionJson {
  const out: ExpansionJson = {
    expression,
    type: typeJson(e.type, e.cls),
    qOrder: rationalToString(e.qOrder),
    terms: expansionTerms(e.series, e.norm).map((t) => ({
      q: rationalToString(t.q),
      zeta: t.zetaHalves.map((h) => rationalToString(zetaExponent(h))),
      c: rationalToString(t.c),
    })),
  };
  if (e.denominator !== null) out.denominator = e.denominator;
  return out;
}
