/**
 * The exact order function of a theta block η^{e₀}·Π ϑ(τ, a_i z)^{e_i} that is
 * holomorphic in z (MATH.md §6, after Gritsenko–Skoruppa–Zagier, *Theta blocks*, 2019):
 *   ord(x) = (e₀ + Σe_i)/24 + ½ Σ e_i B̄₂(a_i x),   B̄₂(x) = {x}² − {x} + 1/6.
 * The block is weak iff ord(0) ≥ 0, holomorphic iff min_{[0,1]} ord ≥ 0, and a cusp form
 * iff that minimum is > 0. ord is quadratic between the breakpoints j/a_i, so the
 * minimum is attained at a breakpoint or at the vertex of one of the pieces.
 */
import { type Rational, rat, radd, rsub, rmul, rdiv, rcmp, rfloor, rIsZero, toNumber } from '../series/index.js';
import type { ThetaFactor } from './divisor-rule.js';

function fractionalPart(x: Rational): Rational {
  return rsub(x, rat(toNumber(rfloor(x))));
}

export function bernoulliBar2(x: Rational): Rational {
  const f = fractionalPart(x);
  return radd(rsub(rmul(f, f), f), rat(1, 6));
}

export function thetaBlockOrder(e0: number, factors: readonly ThetaFactor[], x: Rational): Rational {
  let total = e0;
  let s = rat(0);
  for (const f of factors) {
    total += f.exponent;
    s = radd(s, rmul(rat(f.exponent), bernoulliBar2(rmul(rat(f.a), x))));
  }
  return radd(rat(total, 24), rmul(rat(1, 2), s));
}

/** Breakpoints j/a_i in [0, 1], sorted and distinct. */
function breakpoints(factors: readonly ThetaFactor[]): Rational[] {
  const out: Rational[] = [rat(0), rat(1)];
  for (const f of factors) for (let j = 1; j < f.a; j++) out.push(rat(j, f.a));
  out.sort(rcmp);
  return out.filter((x, i) => i === 0 || rcmp(x, out[i - 1]!) !== 0);
}

/** The vertex of the quadratic piece on (lo, hi), if it lies inside. */
function vertex(factors: readonly ThetaFactor[], lo: Rational, hi: Rational): Rational | null {
  const mid = rdiv(radd(lo, hi), rat(2));
  let num = rat(0);
  let den = rat(0);
  for (const f of factors) {
    const k = rat(toNumber(rfloor(rmul(rat(f.a), mid))));
    // d/dx of ½ e (a x − k)² − ½ e (a x − k) vanishes where Σ e a (a x − k) = ½ Σ e a.
    num = radd(num, radd(rmul(rat(f.exponent * f.a), k), rat(f.exponent * f.a, 2)));
    den = radd(den, rat(f.exponent * f.a * f.a));
  }
  if (rIsZero(den)) return null;
  const x = rdiv(num, den);
  return rcmp(x, lo) > 0 && rcmp(x, hi) < 0 ? x : null;
}

export function thetaBlockMinimumOrder(e0: number, factors: readonly ThetaFactor[]): Rational {
  const pts = breakpoints(factors);
  let best = thetaBlockOrder(e0, factors, pts[0]!);
  for (let i = 0; i < pts.length; i++) {
    const here = thetaBlockOrder(e0, factors, pts[i]!);
    if (rcmp(here, best) < 0) best = here;
    if (i + 1 < pts.length) {
      const v = vertex(factors, pts[i]!, pts[i + 1]!);
      if (v !== null) {
        const o = thetaBlockOrder(e0, factors, v);
        if (rcmp(o, best) < 0) best = o;
      }
    }
  }
  return best;
}

export type ThetaBlockClass = 'not weak' | 'weak' | 'holomorphic' | 'cusp';

export function thetaBlockClass(e0: number, factors: readonly ThetaFactor[]): ThetaBlockClass {
  if (rcmp(thetaBlockOrder(e0, factors, rat(0)), rat(0)) < 0) return 'not weak';
  const min = thetaBlockMinimumOrder(e0, factors);
  const s = rcmp(min, rat(0));
  return s < 0 ? 'weak' : s === 0 ? 'holomorphic' : 'cusp';
}
