/**
 * The digest a certificate records of the coefficients compared (the canonical list
 * is defined in grammar/certificate.schema.json, `comparison.digest`): one line
 * `x;ℓ1,…,ℓn;a;b` + LF per position (x, ℓ) with x ≤ the bound where either side of F
 * is non-zero, in compare order (x, then the ζ-norm of F's index, then ℓ
 * lexicographically), every number a reduced rational `n` or `n/d`; a the left side's
 * coefficient, b the right side's. SHA-256 of the UTF-8 bytes, lower-case hex.
 * Anyone can recompute it from the claim with any exact expansion.
 */
import { createHash } from 'node:crypto';
import { rat, rationalToString } from '../series/index.js';
import type { ComparedRow } from './compared-positions.js';

export interface CoefficientDigest {
  readonly coefficients: number;
  readonly sha256: string;
}

/** The lines of the canonical list, in order (each ends with LF). */
export function* canonicalCoefficientLines(rows: readonly ComparedRow[]): Generator<string> {
  for (const row of rows) {
    const q = rationalToString(row.q);
    for (const c of row.cells) {
      const zeta = c.halves.map((h) => rationalToString(rat(h, 2))).join(',');
      yield `${q};${zeta};${rationalToString(c.left)};${rationalToString(c.right)}\n`;
    }
  }
}

export function coefficientDigest(rows: readonly ComparedRow[]): CoefficientDigest {
  const hash = createHash('sha256');
  let coefficients = 0;
  for (const line of canonicalCoefficientLines(rows)) {
    hash.update(line, 'utf8');
    coefficients++;
  }
  return { coefficients, sha256: hash.digest('hex') };
}
