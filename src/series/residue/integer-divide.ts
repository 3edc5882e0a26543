/**
 * Division of an integer grid by a q-only integer unit U (U(0) = ±1), exact or refused:
 * W = T/U row by row, W_n = U(0)·(T_n − Σ_{k≥1} U_k·W_{n−k}). Before row n is formed,
 * max|T_n| + Σ|U_k|·max|W_{n−k}| — a bound of every partial sum in it, the earlier rows
 * being exact already — is checked below EXACT_LIMIT. Theta blocks are divided so
 * (θ-products over η^a, U = Π(1 − qⁿ)^a): the quotient is small where 1/U is not.
 */
import { type IntegerGrid, EXACT_LIMIT } from './integer-grid.js';
import { maxAbs, nonZeroColumns } from './shared-integers.js';

/** T/U on T's grid; u[k] is U's coefficient of q^k. Null if a partial sum could reach the limit. */
export function divideByUnit(t: IntegerGrid, u: Float64Array): IntegerGrid | null {
  const u0 = u[0];
  if (u0 !== 1 && u0 !== -1) throw new RangeError('internal: division by a q-series that is not a unit');
  const { rows, width, qDen } = t;
  if ((u.length - 1) * qDen < rows - 1) throw new RangeError('internal: a unit known to fewer q-steps than its quotient');
  const shifts: number[] = [];
  const coefficients: number[] = [];
  for (let k = 1; k < u.length && k * qDen < rows; k++) {
    if (u[k] === 0) continue;
    shifts.push(k * qDen);
    coefficients.push(u[k]!);
  }
  const w = Float64Array.from(t.data.subarray(0, rows * width));
  const rowMax = new Float64Array(rows);
  const lo = new Int32Array(rows);
  const hi = new Int32Array(rows);
  for (let n = 0; n < rows; n++) {
    const at = n * width;
    let bound = maxAbs(w.subarray(at, at + width));
    for (let i = 0; i < shifts.length && shifts[i]! <= n; i++) bound += Math.abs(coefficients[i]!) * rowMax[n - shifts[i]!]!;
    if (bound >= EXACT_LIMIT) return null;
    for (let i = 0; i < shifts.length && shifts[i]! <= n; i++) {
      const from = (n - shifts[i]!) * width;
      const c = coefficients[i]!;
      const k1 = hi[n - shifts[i]!]!;
      for (let k = lo[n - shifts[i]!]!; k < k1; k++) w[at + k] -= c * w[from + k]!;
    }
    if (u0 === -1) for (let k = 0; k < width; k++) w[at + k] = -w[at + k]!;
    const row = w.subarray(at, at + width);
    rowMax[n] = maxAbs(row);
    const span = nonZeroColumns(row, 1, width);
    lo[n] = span.lo[0]!;
    hi[n] = span.hi[0]!;
  }
  return { ...t, data: w };
}
