/**
 * The evidence of one comparison (verdict ComparisonEvidence), recorded only when a
 * run asks for it (`CheckOptions.evidence`: certificates, the HTML report): hashing
 * every compared coefficient costs time a plain check does not need to spend.
 */
import { type QZSeries, type Rational, rationalToString } from '../series/index.js';
import type { ComparisonEvidence } from '../verdict/index.js';
import type { Mismatch, ZetaNorm } from './compare-series.js';
import { comparedRows } from './compared-positions.js';
import { coefficientDigest } from './coefficient-digest.js';
import { coefficientGrid } from './coefficient-grid.js';

export function comparisonEvidence(a: QZSeries, b: QZSeries, upTo: Rational, norm: ZetaNorm, mismatch: Mismatch | null): ComparisonEvidence {
  const rows = comparedRows(a, b, upTo, norm);
  const digest = coefficientDigest(rows);
  return { upTo: rationalToString(upTo), coefficients: digest.coefficients, sha256: digest.sha256, grid: coefficientGrid(rows, mismatch, norm) };
}
