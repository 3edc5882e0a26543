/**
 * Random expressions over the named leaves and the SeriesSource combinators, for
 * whole-expansion tests of the modular back-end. Each expression knows its valuation
 * and the least order `minX` at which no part of it is asked below its own valuation.
 */
import fc from 'fast-check';
import {
  type SeriesSource,
  type Rational,
  type QZSeries,
  type Majorant,
  type Int,
  gcd,
  JSBI,
  int,
  rat,
  radd,
  rsub,
  rmul,
  rmax,
  rfloor,
  rdiv,
  rationalToString,
  sliceExponent,
  forEachTerm,
  abs,
  productSource,
  powerSource,
  sumSource,
  scaledSource,
  quotientSource,
  cached,
} from '../../../src/series/index.js';
import { thetaSource, etaPowerSource, eisensteinSource } from '../../../src/forms/leaves.js';
import { phiMinus2Source } from '../../../src/forms/phi-m2-1.js';
import { phi0Source } from '../../../src/forms/phi-0-1.js';
import { log2Int } from './residue-helpers.js';
import { expect } from 'vitest';

export type Expr =
  | { readonly kind: 'theta'; readonly a: number }
  | { readonly kind: 'eta'; readonly e: number }
  | { readonly kind: 'eis'; readonly k: number }
  | { readonly kind: 'phim2' }
  | { readonly kind: 'phi0' }
  | { readonly kind: 'prod'; readonly factors: readonly Expr[] }
  | { readonly kind: 'pow'; readonly base: Expr; readonly k: number }
  | { readonly kind: 'sum'; readonly terms: readonly { readonly expr: Expr; readonly c: readonly [number, number] }[] }
  | { readonly kind: 'scale'; readonly expr: Expr; readonly c: readonly [number, number] }
  | { readonly kind: 'quot'; readonly t: Expr; readonly g: Expr }
  | { readonly kind: 'square'; readonly expr: Expr }
  | { readonly kind: 'cached'; readonly expr: Expr };

export interface Built {
  readonly src: SeriesSource;
  /** Every part is asked at or above its own valuation from this order on. */
  readonly minX: Rational;
  readonly text: string;
}

const thetaArb = fc.integer({ min: 1, max: 5 }).map((a): Expr => ({ kind: 'theta', a }));
const etaArb = fc.integer({ min: -12, max: 24 }).map((e): Expr => ({ kind: 'eta', e }));
const eisArb = fc.constantFrom(2, 4, 6, 8, 10, 12, 14).map((k): Expr => ({ kind: 'eis', k }));
const leafArb: fc.Arbitrary<Expr> = fc.oneof(
  thetaArb,
  etaArb,
  eisArb,
  fc.constant<Expr>({ kind: 'phim2' }),
  fc.constant<Expr>({ kind: 'phi0' }),
);
const coefficient = fc.oneof(
  fc.constantFrom<[number, number]>([1, 1], [-1, 1], [1, 691], [-3, 4], [0, 1], [1728, 1], [-65520, 691]),
  fc.tuple(fc.integer({ min: -50, max: 50 }), fc.integer({ min: 1, max: 30 })),
);

/** Expressions of depth ≤ 3 (at most a few hundred terms per slice at the orders used). */
export const exprArb: fc.Arbitrary<Expr> = fc.letrec<{ expr: Expr }>((tie) => ({
  expr: fc.oneof(
    { depthSize: 'small', withCrossShrink: true, maxDepth: 3 },
    { arbitrary: leafArb, weight: 4 },
    { arbitrary: fc.array(tie('expr'), { minLength: 2, maxLength: 3 }).map((factors): Expr => ({ kind: 'prod', factors })), weight: 4 },
    { arbitrary: fc.tuple(tie('expr'), fc.integer({ min: 1, max: 7 })).map(([base, k]): Expr => ({ kind: 'pow', base, k })), weight: 2 },
    { arbitrary: fc.tuple(etaArb, fc.integer({ min: -3, max: 3 })).map(([base, k]): Expr => ({ kind: 'pow', base, k })), weight: 1 },
    { arbitrary: fc.tuple(eisArb, fc.integer({ min: -2, max: -1 })).map(([base, k]): Expr => ({ kind: 'pow', base, k })), weight: 1 },
    {
      arbitrary: fc.array(fc.record({ expr: tie('expr'), c: coefficient }), { minLength: 1, maxLength: 3 }).map((terms): Expr => ({ kind: 'sum', terms })),
      weight: 3,
    },
    { arbitrary: fc.tuple(tie('expr'), coefficient).map(([expr, c]): Expr => ({ kind: 'scale', expr, c })), weight: 1 },
    {
      arbitrary: fc
        .tuple(fc.oneof(thetaArb, etaArb), fc.oneof(leafArb, fc.array(leafArb, { minLength: 2, maxLength: 2 }).map((factors): Expr => ({ kind: 'prod', factors }))))
        .map(([t, g]): Expr => ({ kind: 'quot', t, g })),
      weight: 1,
    },
    { arbitrary: tie('expr').map((expr): Expr => ({ kind: 'square', expr })), weight: 1 },
    { arbitrary: tie('expr').map((expr): Expr => ({ kind: 'cached', expr })), weight: 1 },
  ),
})).expr;

function fail(): never {
  throw new Error('test expression: an exact quotient was not exact');
}

export function build(e: Expr): Built {
  switch (e.kind) {
    case 'theta':
      return { src: thetaSource(e.a), minX: rat(1, 8), text: `θ(${e.a}z)` };
    case 'eta':
      return { src: etaPowerSource(e.e), minX: rat(e.e, 24), text: `η^${e.e}` };
    case 'eis':
      return { src: eisensteinSource(e.k), minX: rat(0), text: `E${e.k}` };
    case 'phim2':
      return { src: phiMinus2Source(), minX: rat(0), text: 'φ₋₂' };
    case 'phi0':
      return { src: phi0Source(), minX: rat(0), text: 'φ₀' };
    case 'prod': {
      const parts = e.factors.map(build);
      const src = productSource(parts.map((p) => p.src));
      let minX = src.valuation;
      for (const p of parts) minX = rmax(minX, radd(p.minX, rsub(src.valuation, p.src.valuation)));
      return { src, minX, text: `(${parts.map((p) => p.text).join('·')})` };
    }
    case 'pow': {
      const b = build(e.base);
      const src = powerSource(b.src, e.k);
      // own powers (η) and exact-engine powers (k ≤ 0) start at their valuation
      const own = e.base.kind === 'eta' || e.k <= 0;
      const minX = own ? src.valuation : rmax(src.valuation, radd(b.minX, rmul(b.src.valuation, rat(e.k - 1))));
      return { src, minX, text: `${b.text}^${e.k}` };
    }
    case 'sum': {
      const parts = e.terms.map((t) => ({ b: build(t.expr), c: rat(t.c[0], t.c[1]) }));
      const src = sumSource(parts.map((p) => ({ source: p.b.src, coefficient: p.c })));
      let minX = parts[0]!.b.minX;
      for (const p of parts) minX = rmax(minX, p.b.minX);
      return { src, minX, text: `[${parts.map((p) => `${rationalToString(p.c)}·${p.b.text}`).join(' + ')}]` };
    }
    case 'scale': {
      const b = build(e.expr);
      const c = rat(e.c[0], e.c[1]);
      return { src: scaledSource(b.src, c), minX: b.minX, text: `${rationalToString(c)}·${b.text}` };
    }
    case 'quot': {
      const t = build(e.t);
      const g = build(e.g);
      const src = quotientSource(productSource([t.src, g.src]), t.src, t.src.valuation, fail);
      return { src, minX: rmax(src.valuation, g.minX), text: `(${t.text}·${g.text})/${t.text}` };
    }
    case 'square': {
      const b = build(e.expr);
      const x = cached(b.src);
      const src = productSource([x, x]);
      return { src, minX: rmax(src.valuation, radd(b.minX, b.src.valuation)), text: `sq(${b.text})` };
    }
    case 'cached': {
      const b = build(e.expr);
      return { src: cached(b.src), minX: b.minX, text: b.text };
    }
  }
}

/** Offsets past minX: on the integral grid, at eighths and thirds, up to six steps. */
export const offsetArb = fc.constantFrom(rat(0), rat(1, 8), rat(1, 3), rat(1), rat(3, 2), rat(2), rat(7, 3), rat(3), rat(6));

function floorDiv(x: Rational, h: number): number {
  return JSBI.toNumber(rfloor(rdiv(x, rat(h))));
}

/**
 * A majorant bounds the series expanded to X: every block's Σ|c| (exponents ≤ X) is at
 * most m·2^scale, D·c is integral, every prime of the denominator divides `avoid`, and
 * 2^heightBits bounds D·|c|.
 */
export function expectMajorantBounds(s: QZSeries, m: Majorant, X: Rational, heightBits: number, label: string): void {
  const sums = new Map<number, Int>();
  let maxNum = int(0);
  s.slices.forEach((sl, i) => {
    const x = sliceExponent(s, i);
    if (JSBI.greaterThan(JSBI.multiply(x.num, X.den), JSBI.multiply(X.num, x.den))) return;
    const j = floorDiv(x, m.h);
    forEachTerm(sl, (_e, c) => {
      sums.set(j, JSBI.add(sums.get(j) ?? int(0), abs(c)));
      if (JSBI.greaterThan(abs(c), maxNum)) maxNum = abs(c);
    });
  });
  const logDen = log2Int(s.den);
  for (const [j, sum] of sums) {
    if (JSBI.equal(sum, int(0))) continue;
    const idx = j - m.first;
    expect(idx >= 0 && idx < m.m.length && m.m[idx]! > 0, `${label}: block ${j} has terms but no bound`).toBe(true);
    const bound = Math.log2(m.m[idx]!) + m.scale;
    expect(log2Int(sum) - logDen, `${label}: block ${j}`).toBeLessThanOrEqual(bound);
  }
  // s is reduced, so D·c is integral for all c exactly when s.den | D
  expect(JSBI.toNumber(JSBI.remainder(m.den, s.den)), `${label}: den`).toBe(0);
  let rest = s.den;
  for (let g = gcd(rest, m.avoid); !JSBI.equal(g, int(1)); g = gcd(rest, m.avoid)) rest = JSBI.divide(rest, g);
  expect(rest.toString(), `${label}: a prime of the denominator is not avoided`).toBe('1');
  if (!JSBI.equal(maxNum, int(0))) expect(log2Int(maxNum) - logDen + log2Int(m.den), `${label}: height`).toBeLessThanOrEqual(heightBits);
}

