/**
 * Inverses of q-only units modulo each prime by Newton's iteration (von zur Gathen &
 * Gerhard, *Modern Computer Algebra*, 3rd ed., Thm 9.4): with g ≡ f⁻¹ mod t^m,
 * g′ = g + g·(1 − f·g) ≡ f⁻¹ mod t^{2m}; each step is two products of length 2m, so
 * the whole inverse costs a few products of the full length.
 */
import { type Rational, rneg, rmin, radd, rmul, rat } from '../rational.js';
import { sliceCountTo } from '../qz-series.js';
import { invmod } from '../modular/mulmod.js';
import { nttMultiply } from '../modular/ntt.js';
import type { NttPrime } from '../modular/ntt-primes.js';
import type { ResidueSeries } from './residue-series.js';

function inverseOnePrime(f: Int32Array, rows: number, prime: NttPrime): Int32Array {
  const p = prime.p | 0;
  const g = new Int32Array(rows);
  if (rows === 0) return g;
  g[0] = invmod(f[0]!, p);
  for (let m = 1; m < rows; m *= 2) {
    const m2 = Math.min(2 * m, rows);
    const fg = nttMultiply(f.subarray(0, Math.min(m2, f.length)), g.subarray(0, m), prime);
    // e = 1 − f·g vanishes below t^m; only its terms m … m2 − 1 matter
    const e = new Int32Array(m2 - m);
    for (let i = m; i < m2; i++) {
      const x = i < fg.length ? fg[i]! : 0;
      e[i - m] = x === 0 ? 0 : p - x;
    }
    const ge = nttMultiply(g.subarray(0, m2 - m), e, prime);
    for (let i = m; i < m2; i++) g[i] = ge[i - m]!;
  }
  return g;
}

/** f⁻¹ to q-order X, f one column with a unit lowest row (1/f starts at −start(f)). */
export function inverseNewtonResidues(f: ResidueSeries, X: Rational): ResidueSeries {
  if (f.width !== 1 || f.rows === 0 || f.data.some((a) => a[0] === 0)) throw new RangeError('internal: Newton inverse of a non-unit');
  const start = rneg(f.start);
  // 1/f is known as far as f is, relative to the leading terms
  const exactTo = rmin(X, radd(f.exactTo, rmul(f.start, rat(-2))));
  const rows = sliceCountTo(start, f.qDen, exactTo);
  const data = f.primes.map((prime, i) => inverseOnePrime(f.data[i]!, rows, prime));
  return { ...f, start, rows, exactTo, zLo: -f.zLo, zStep: 1, width: 1, data };
}
