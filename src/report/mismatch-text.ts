/**
 * The first differing coefficient as a line of the terminal report:
 * "at q^1 ζ^0: left -2, right -288/143". Exponents use the notation of `expand`
 * (`q^(1/8)`, `ζ^(-1/2)`); several variables are numbered ζ1, ζ2, ….
 */
import { parseRational } from '../series/index.js';
import type { MismatchRecord } from '../verdict/index.js';
import { powerText } from './exponent-text.js';

/** `base^e` for an exponent given as a rational string. */
export function exponentText(base: string, e: string): string {
  const r = parseRational(e);
  return r === undefined ? `${base}^(${e})` : powerText(base, r, false);
}

export function mismatchText(m: MismatchRecord): string {
  const zetas = m.zeta.length === 1 ? [exponentText('ζ', m.zeta[0]!)] : m.zeta.map((e, i) => exponentText(`ζ${i + 1}`, e));
  return `at ${[exponentText('q', m.q), ...zetas].join(' ')}: left ${m.left}, right ${m.right}`;
}
