/**
 * The terms of a q-only integer unit U (U(0) = ±1) that a division by it uses, on a
 * quotient grid of `rows` rows, qDen rows per q-step (integer-divide.ts, residue-divide.ts).
 */
export interface UnitTerms {
  readonly u0: 1 | -1;
  /** Row shifts k·qDen of the non-zero U_k, k ≥ 1, below `rows`, increasing. */
  readonly shifts: Int32Array;
  readonly coefficients: Float64Array;
  /** Σ|U_k| over those terms. */
  readonly total: number;
}

export function unitTerms(u: Float64Array, qDen: number, rows: number): UnitTerms {
  const u0 = u[0];
  if (u0 !== 1 && u0 !== -1) throw new RangeError('internal: division by a q-series that is not a unit');
  if ((u.length - 1) * qDen < rows - 1) throw new RangeError('internal: a unit known to fewer q-steps than its quotient');
  const shifts: number[] = [];
  const coefficients: number[] = [];
  let total = 0;
  for (let k = 1; k < u.length && k * qDen < rows; k++) {
    if (u[k] === 0) continue;
    shifts.push(k * qDen);
    coefficients.push(u[k]!);
    total += Math.abs(u[k]!);
  }
  return { u0, shifts: Int32Array.from(shifts), coefficients: Float64Array.from(coefficients), total };
}
