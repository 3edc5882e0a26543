/**
 * A product as an integer grid: the factors with integers multiplied (integer-multiply.ts),
 * then divided by the units of the factors given as reciprocals (integer-divide.ts). A
 * theta block θ(a₁z)···θ(a_nz)/η^a is so computed in small integers all along, where
 * multiplying by 1/η^a would pass through its large coefficients.
 */
import { type Rational, radd, rsub, rcmp, rat, rmul } from '../rational.js';
import type { ViewLeaf } from './modular-view.js';
import { type IntegerGrid, truncateIntegers } from './integer-grid.js';
import { multiplyIntegers } from './integer-multiply.js';
import { divideByUnit } from './integer-divide.js';

/** Whether a product of these factors can be tried as integers: each has integers or a reciprocal, and one has integers. */
export function integerProductPossible(factors: readonly ViewLeaf[]): boolean {
  return factors.every((f) => f.view.reciprocal !== undefined || f.view.integers !== undefined) && factors.some((f) => f.view.reciprocal === undefined);
}

/** The factors down to their leaves, counts multiplied out. */
function flatten(factors: readonly ViewLeaf[], into: ViewLeaf[] = [], times = 1): ViewLeaf[] {
  for (const f of factors) {
    if (f.view.leaves !== undefined) flatten(f.view.leaves, into, times * f.count);
    else into.push({ ...f, count: f.count * times });
  }
  return into;
}

/** The ζ-span of a grid, in halves: narrow factors go first so the partial products stay narrow longest. */
function span(g: IntegerGrid): number {
  return (g.width - 1) * g.zStep;
}

/**
 * A product tried as integers: the whole of it when every step stayed exact; else the
 * product of the leaves with integers when that much did (the reciprocals then multiply
 * it by the rules, their residues and majorants), else nothing.
 */
export interface IntegerProduct {
  readonly whole: IntegerGrid | null;
  /** The leaves with integers multiplied, known to `order` (X − the units' valuation). */
  readonly plain: { readonly grid: IntegerGrid; readonly valuation: Rational; readonly order: Rational } | null;
  /** The leaves given as reciprocals, each with its count. */
  readonly units: readonly ViewLeaf[];
}

/**
 * The product (valuation v) to q-order X as integers. A leaf of valuation w is needed
 * to X − (v − w); a partial product to X − (the valuation still to come).
 */
export function productIntegers(factors: readonly ViewLeaf[], v: Rational, X: Rational): IntegerProduct {
  const leaves = flatten(factors);
  const plainLeaves = leaves.filter((f) => f.view.reciprocal === undefined);
  const units = leaves.filter((f) => f.view.reciprocal !== undefined);
  const none: IntegerProduct = { whole: null, plain: null, units };
  let vUnits = rat(0);
  for (const f of units) vUnits = radd(vUnits, rmul(f.valuation, rat(f.count)));
  const grids: { grid: IntegerGrid; valuation: Rational }[] = [];
  for (const f of plainLeaves) {
    const g = f.view.integers!(radd(X, rsub(f.valuation, v)));
    if (g === null) return none;
    for (let i = 0; i < f.count; i++) grids.push({ grid: g, valuation: f.valuation });
  }
  grids.sort((a, b) => span(a.grid) - span(b.grid));
  // the plain factors' product is needed to X − v(units)
  const XP = rsub(X, vUnits);
  let rest = rsub(v, vUnits);
  let acc: IntegerGrid | null = null;
  for (const { grid, valuation } of grids) {
    rest = rsub(rest, valuation);
    acc = acc === null ? grid : multiplyIntegers(acc, grid, rsub(XP, rest));
    if (acc === null) return none;
  }
  const plain = { grid: acc!, valuation: rsub(v, vUnits), order: XP };
  let q: IntegerGrid = { ...acc!, start: radd(acc!.start, vUnits), exactTo: radd(acc!.exactTo, vUnits) };
  for (const f of units) {
    // the units are needed as many q-steps as the quotient's grid spans
    const us = f.view.reciprocal!(radd(f.valuation, rsub(q.exactTo, q.start)));
    if (us === null) return { whole: null, plain, units };
    for (let i = 0; i < f.count; i++) {
      for (const u of us) {
        const next = divideByUnit(q, u);
        if (next === null) return { whole: null, plain, units };
        q = next;
      }
    }
  }
  return { whole: rcmp(q.exactTo, X) > 0 ? truncateIntegers(q, X) : q, plain, units };
}
