/**
 * The order of ζ-exponents within a q-slice (CLAIMS.md, "first" mismatch and JSON
 * terms): |ℓ| for one variable; ℓᵀM⁻¹ℓ for several (ℓᵀℓ when M is singular). Keys are
 * exact integers: with D the least common denominator of M⁻¹ and h = 2ℓ (halves),
 * 4D·ℓᵀM⁻¹ℓ = hᵀ(D·M⁻¹)h.
 */
import { JSBI, type Int, int, lcm, toNumber } from '../series/index.js';
import { type ModularType, matrixInverse } from '../types/index.js';
import { type ZetaNorm, defaultZetaNorm } from './compare-series.js';

export function zetaNormFor(t: ModularType | null): ZetaNorm {
  if (t === null || t.index.length <= 1) return defaultZetaNorm;
  const inv = matrixInverse(t.index);
  if (inv === null) return defaultZetaNorm;
  let D: Int = int(1);
  for (const row of inv) for (const x of row) D = lcm(D, x.den);
  const N = inv.map((row) => row.map((x) => toNumber(JSBI.multiply(x.num, JSBI.divide(D, x.den)))));
  return (h: readonly number[]): number => {
    let s = 0;
    for (let i = 0; i < h.length; i++) {
      if (h[i] === 0) continue;
      const row = N[i]!;
      for (let j = 0; j < h.length; j++) s += h[i]! * row[j]! * h[j]!;
    }
    return s;
  };
}
