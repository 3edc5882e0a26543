/**
 * The numbers a bound was derived from (MATH.md §6), for certificates: K and m for
 * Theorem A in one variable (m as the theorem uses it, max(m, 0)); K, M, rank M and ρ
 * for several variables. `boundFor` gives the q-order and the derivation as text; a
 * certificate also states the inputs, so a reader can redo the arithmetic.
 */
import { rat, rmax, rationalToString } from '../series/index.js';
import { type ModularType, scalarIndexOf } from '../types/index.js';
import { theoremBBound } from '../bound/index.js';
import type { BoundParameters } from '../verdict/index.js';

export function boundParameters(t: ModularType): BoundParameters {
  const weight = rationalToString(t.weight);
  if (t.index.length === 1) return { weight, index: rationalToString(rmax(scalarIndexOf(t), rat(0))) };
  const b = theoremBBound(t.weight, t.index);
  return { weight, index: t.index.map((row) => row.map(rationalToString)), rank: b.rank, rho: rationalToString(b.rho) };
}
