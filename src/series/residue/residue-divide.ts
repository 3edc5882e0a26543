/**
 * Division of a residue series by a q-only integer unit U (U(0) = ±1), per prime:
 * W_n = U(0)·(T_n − Σ_{k≥1} U_k·W_{n−k}) row by row, as integer-divide.ts does in exact
 * integers. A theta block whose quotient by η^a outgrows 2^52 is so divided modulo
 * each prime: the theta part is exact and η^a's units are sparse (Jacobi's cube,
 * Euler's series), where multiplying by 1/η^a would take its dense expansion.
 */
import { reduceDouble } from '../modular/mulmod.js';
import type { ResidueSeries } from './residue-series.js';
import { unitTerms } from './unit-terms.js';

/**
 * T/U on T's grid; u[k] is U's coefficient of q^k, known as far as T's rows reach. Each
 * row sums |T_n| + Σ|U_k|·W < (1 + Σ|U_k|)·p in doubles: exact while Σ|U_k| < 2^21.
 */
export function divideResiduesByUnit(t: ResidueSeries, u: Float64Array): ResidueSeries {
  const { rows, width, qDen } = t;
  const { u0, shifts, coefficients, total } = unitTerms(u, qDen, rows);
  if (total >= 2 ** 21) throw new RangeError('internal: a unit too large for the residue division');
  const data = t.data.map((a, pi) => {
    const p = t.primes[pi]!.p;
    const pinv = 1 / p;
    const w = new Int32Array(rows * width);
    const acc = new Float64Array(width);
    // the columns [lo, hi) of each row of w outside which it is zero
    const lo = new Int32Array(rows);
    const hi = new Int32Array(rows);
    for (let n = 0; n < rows; n++) {
      const at = n * width;
      for (let k = 0; k < width; k++) acc[k] = a[at + k]!;
      for (let i = 0; i < shifts.length && shifts[i]! <= n; i++) {
        const src = n - shifts[i]!;
        const from = src * width;
        const c = coefficients[i]!;
        const k1 = hi[src]!;
        for (let k = lo[src]!; k < k1; k++) acc[k] -= c * w[from + k]!;
      }
      let first = width;
      let last = 0;
      for (let k = 0; k < width; k++) {
        const r = reduceDouble(acc[k]!, p, pinv);
        if (r === 0) continue;
        w[at + k] = u0 === 1 ? r : p - r;
        if (first === width) first = k;
        last = k + 1;
      }
      lo[n] = first === width ? 0 : first;
      hi[n] = last;
    }
    return w;
  });
  return { ...t, data };
}
