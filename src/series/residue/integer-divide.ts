/**
 * Division of an integer grid by a q-only integer unit U (U(0) = ±1), exact or refused:
 * W = T/U row by row, W_n = U(0)·(T_n − Σ_{k≥1} U_k·W_{n−k}). Before row n is formed,
 * max|T_n| + Σ|U_k|·max|W_{n−k}| — a bound of every partial sum in it, the earlier rows
 * being exact already — is checked below EXACT_LIMIT. Theta blocks are divided so
 * (θ-products over η^a, U = Π(1 − qⁿ)^a): the quotient is small where 1/U is not.
 */
import { type IntegerGrid, EXACT_LIMIT } from './integer-grid.js';
import { unitTerms } from './unit-terms.js';

/** T/U on T's grid; u[k] is U's coefficient of q^k. Null if a partial sum could reach the limit. */
export function divideByUnit(t: IntegerGrid, u: Float64Array): IntegerGrid | null {
  const { rows, width, qDen } = t;
  const { u0, shifts, coefficients } = unitTerms(u, qDen, rows);
  const terms = shifts.length;
  const w = Float64Array.from(t.data.subarray(0, rows * width));
  const rowMax = new Float64Array(rows);
  const lo = new Int32Array(rows);
  const hi = new Int32Array(rows);
  for (let n = 0; n < rows; n++) {
    const at = n * width;
    let bound = 0;
    for (let k = 0; k < width; k++) bound = Math.max(bound, Math.abs(w[at + k]!));
    let live = 0;
    while (live < terms && shifts[live]! <= n) live++;
    for (let i = 0; i < live; i++) bound += Math.abs(coefficients[i]!) * rowMax[n - shifts[i]!]!;
    if (bound >= EXACT_LIMIT) return null;
    for (let i = 0; i < live; i++) {
      const src = n - shifts[i]!;
      const from = src * width - at;
      const c = coefficients[i]!;
      const k1 = at + hi[src]!;
      for (let k = at + lo[src]!; k < k1; k++) w[k] -= c * w[k + from]!;
    }
    let max = 0;
    let first = width;
    let last = 0;
    for (let k = 0; k < width; k++) {
      let x = w[at + k]!;
      if (u0 === -1) w[at + k] = x = -x;
      if (x === 0) continue;
      max = Math.max(max, Math.abs(x));
      if (first === width) first = k;
      last = k + 1;
    }
    rowMax[n] = max;
    lo[n] = first === width ? 0 : first;
    hi[n] = last;
  }
  return { ...t, data: w };
}
