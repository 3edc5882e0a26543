/**
 * A product's modular view (MATH.md §8). Where every factor offers integers or a
 * reciprocal (a theta block), the product is first tried as exact integers
 * (integer-product.ts): it is then its own majorant. Where only the theta part stays
 * exact — the quotient by η^a outgrows 2^52 — that part is one exact factor: the
 * majorant is the rules' product of its exact one with the reciprocals', and the
 * residues are its own divided by the reciprocals' sparse units modulo each prime —
 * instead of a product per theta per prime, and a dense one by 1/η^a.
 */
import { type Rational, radd, rsub, rcmp, rmul, rat } from '../rational.js';
import type { NttPrime } from '../modular/ntt-primes.js';
import { type ModularView, type ViewLeaf, lastOrder } from './modular-view.js';
import { type Majorant, majorantProduct, zeroMajorant } from './majorant.js';
import { type ResidueSeries, zeroResidues, truncateResidues } from './residue-series.js';
import { divideResiduesByUnit } from './residue-divide.js';
import { multiplyResidues } from './residue-multiply.js';
import { type IntegerGrid, majorantOfIntegers, residuesOfIntegers, truncateIntegers } from './integer-grid.js';
import { type IntegerProduct, integerProductPossible, productIntegers } from './integer-product.js';

interface Factor {
  readonly view: ModularView;
  readonly valuation: Rational;
}

/** The rules' majorant of a product of factors (valuation v) to X: each factor to X − (v − its valuation). */
function majorantByRules(factors: readonly Factor[], v: Rational, X: Rational, h: number): Majorant {
  return majorantProduct(
    factors.map((f) => ({ majorant: f.view.majorant(radd(X, rsub(f.valuation, v)), h), valuation: f.valuation })),
    X,
  );
}

/** The residues of a product of factors (valuation v) to X, the partial products each to X − the valuation still to come. */
function residuesByRules(factors: readonly Factor[], v: Rational, X: Rational, primes: readonly NttPrime[]): ResidueSeries {
  let acc: ResidueSeries | null = null;
  let rest = v;
  for (const f of factors) {
    const part = f.view.residues(radd(X, rsub(f.valuation, v)), primes);
    rest = rsub(rest, f.valuation);
    acc = acc === null ? part : multiplyResidues(acc, part, rsub(X, rest));
  }
  return acc!;
}

/** An exact grid known to `order` as a view (asked at that order or below). */
function gridView(g: IntegerGrid): ModularView {
  const cut = (X: Rational): IntegerGrid => (rcmp(X, g.exactTo) < 0 ? truncateIntegers(g, X) : g);
  return {
    majorant: (X, h) => majorantOfIntegers(cut(X), X, h),
    residues: (X, primes) => residuesOfIntegers(cut(X), primes),
  };
}

/** The exact theta part and the reciprocals as factors, or null if a reciprocal has no view of its power. */
function splitFactors(p: IntegerProduct): Factor[] | null {
  if (p.plain === null) return null;
  const out: Factor[] = [{ view: gridView(p.plain.grid), valuation: p.plain.valuation }];
  for (const u of p.units) {
    const view = u.count === 1 ? u.view : u.view.power?.(u.count);
    if (view === undefined) return null;
    out.push({ view, valuation: rmul(u.valuation, rat(u.count)) });
  }
  return out;
}

/**
 * The residues of the exact theta part divided by the reciprocals' units, row by row
 * modulo each prime (residue-divide.ts), to X; null if a reciprocal gives no units.
 */
function dividedResidues(p: IntegerProduct, X: Rational, primes: readonly NttPrime[]): ResidueSeries | null {
  if (p.plain === null) return null;
  const { grid } = p.plain;
  let vUnits = rat(0);
  for (const u of p.units) vUnits = radd(vUnits, rmul(u.valuation, rat(u.count)));
  let r: ResidueSeries = { ...residuesOfIntegers(grid, primes), start: radd(grid.start, vUnits), exactTo: radd(grid.exactTo, vUnits) };
  for (const u of p.units) {
    const us = u.view.reciprocal!(radd(u.valuation, rsub(r.exactTo, r.start)));
    if (us === null) return null;
    for (let i = 0; i < u.count; i++) for (const unit of us) r = divideResiduesByUnit(r, unit);
  }
  return rcmp(r.exactTo, X) > 0 ? truncateResidues(r, X) : r;
}

export function productView(factors: readonly ViewLeaf[], v: Rational): ModularView {
  const parts = integerProductPossible(factors) ? lastOrder((X: Rational) => (rcmp(X, v) < 0 ? null : productIntegers(factors, v, X))) : undefined;
  const route = (X: Rational): { parts: IntegerProduct | null; whole: IntegerGrid | null; factors: readonly Factor[] } => {
    const p = parts?.(X) ?? null;
    return { parts: p, whole: p?.whole ?? null, factors: (p === null ? null : splitFactors(p)) ?? factors };
  };
  return {
    majorant(X, h) {
      if (rcmp(X, v) < 0) return zeroMajorant(h);
      const r = route(X);
      return r.whole !== null ? majorantOfIntegers(r.whole, X, h) : majorantByRules(r.factors, v, X, h);
    },
    residues(X, primes) {
      if (rcmp(X, v) < 0) return zeroResidues(primes, v, 1, X);
      const r = route(X);
      if (r.whole !== null) return residuesOfIntegers(r.whole, primes);
      return (r.parts === null ? null : dividedResidues(r.parts, X, primes)) ?? residuesByRules(r.factors, v, X, primes);
    },
    ...(parts ? { integers: (X: Rational) => parts(X)?.whole ?? null, leaves: factors } : {}),
  };
}
