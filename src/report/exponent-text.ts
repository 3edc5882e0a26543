/** Exponent helpers for renderers; the power notation itself lives in series/power-text.ts. */
import { type Rational, rat } from '../series/index.js';

export { powerText } from '../series/index.js';

/** ζ-exponent from units of ½. */
export function zetaExponent(halves: number): Rational {
  return rat(halves, 2);
}
