/**
 * `lattice NAME = [[…]]` must be an even positive definite Gram matrix (CLAIMS.md):
 * integral, symmetric, even diagonal, positive definite. Returns what is wrong, or null.
 */
import { parseRational, rIsInteger, type Rational } from '../series/index.js';
import { isEvenGram, isPositiveDefinite, isSymmetric } from '../types/index.js';

export function latticeProblem(rows: readonly (readonly string[])[]): string | null {
  const n = rows.length;
  if (n === 0 || rows.some((r) => r.length !== n)) return 'the Gram matrix must be square';
  const G: Rational[][] = rows.map((r) => r.map((x) => parseRational(x)!));
  if (G.some((r) => r.some((x) => x === undefined || !rIsInteger(x)))) return 'the Gram matrix must have integer entries';
  if (!isSymmetric(G)) return 'the Gram matrix must be symmetric';
  if (!isEvenGram(G)) return 'the lattice must be even (even diagonal entries)';
  if (!isPositiveDefinite(G)) return 'the Gram matrix must be positive definite';
  if (G.some((r) => r.some((x) => Math.abs(Number(x.num.toString())) > 1e6))) return 'the entries are too large';
  return null;
}
