/**
 * A claim `E is TYPE [weak|holomorphic|cusp]` (CLAIMS.md, MATH.md §4 item 4, §6).
 * The type comes from the rules; the qualifier is decided by the coefficients that
 * MATH.md §6 names. A quotient by a non-unit that is not a theta block: a failed exact
 * slice division proves a pole (refuted); otherwise the assertion stays unproved.
 */
import {
  type Rational,
  rat,
  radd,
  rcmp,
  rmax,
  rationalToString,
  divideExact,
  JSBI,
  ONE,
  sliceExponent,
  rational,
  powerText,
  sliceIsZero,
  hasUnitLead,
  forEachTerm,
  lexCompare,
} from '../series/index.js';
import type { Expr, TypeSpec } from '../lang/ast.js';
import {
  type ModularType,
  type Holomorphy,
  typesEqual,
  typeDifferences,
  formatType,
  scalarIndexOf,
  mustVanish,
  holomorphyOrder,
  holomorphyOrderMatrix,
  mustVanishVector,
  matrixInverse,
  isPositiveDefinite,
} from '../types/index.js';
import type { ZetaNorm } from './compare-series.js';
import { zetaNormFor } from './zeta-norm.js';
import type { MismatchRecord } from '../verdict/index.js';
import type { Monomial } from './atom.js';
import { evaluate, type EvalContext } from './evaluate.js';
import { isZeroMonomial } from './monomial.js';
import { monomialType, monomialClass, quasiReasons } from './monomial-parts.js';
import { numeratorSource } from './monomial-source.js';
import { isIdenticallyZero, numeratorAndDenominator, boundOfType } from './side-zero.js';
import { typeFromSpec } from './type-spec.js';
import type { CheckOptions } from './check-options.js';
import type { Outcome } from './outcome.js';
import { typeRecord } from './type-record.js';

interface Offending {
  readonly q: Rational;
  readonly halves: readonly number[];
  readonly c: Rational;
}

/**
 * What the property asks of the coefficients: the q-order that decides it and, per
 * coefficient, whether it must vanish. One variable: |r| ≤ m, x ≤ m/4 (MATH.md §6);
 * several: the hyperbolic norm x − ¼ℓᵀM⁻¹ℓ up to ρ (positive definite M only).
 */
interface Criterion {
  readonly order: Rational;
  readonly forbids: (q: Rational, halves: readonly number[]) => boolean;
  readonly describe: string;
}

function criterion(property: Holomorphy, t: ModularType): Criterion | null {
  if (t.index.length === 1) {
    const index = scalarIndexOf(t);
    return {
      order: holomorphyOrder(property, index),
      forbids: (q, h) => {
        const r = rat(h[0]!, 2);
        const inRange = property === 'weak' || rcmp(rat(Math.abs(h[0]!), 2), index) <= 0;
        return inRange && mustVanish(property, q, r, index);
      },
      describe: `x ≤ ${rationalToString(holomorphyOrder(property, index))} and |r| ≤ m`,
    };
  }
  if (property === 'weak') return { order: rat(0), forbids: (q) => rcmp(q, rat(0)) < 0, describe: 'x < 0' };
  const inv = matrixInverse(t.index);
  if (inv === null || !isPositiveDefinite(t.index)) return null;
  const order = holomorphyOrderMatrix(property, t.index);
  return {
    order,
    forbids: (q, h) => mustVanishVector(property, q, h.map((x) => rat(x, 2)), inv),
    describe: `x ≤ ${rationalToString(order)} (ρ of the index) with the hyperbolic norm x − ¼ℓᵀM⁻¹ℓ`,
  };
}

/** The first coefficient (q, then the ζ-norm, then ℓ) that the property forbids, if any. */
function firstForbidden(m: Monomial, property: Holomorphy, c: Criterion, norm: ZetaNorm): Offending | null {
  const src = numeratorSource(m);
  if (rcmp(src.valuation, rat(0)) >= 0 && property === 'weak') return null;
  if (rcmp(c.order, src.valuation) < 0) return null;
  const s = src.expand(c.order);
  for (let i = 0; i < s.slices.length; i++) {
    const q = sliceExponent(s, i);
    const hits: Offending[] = [];
    forEachTerm(s.slices[i]!, (e, v) => {
      if (c.forbids(q, e)) hits.push({ q, halves: e, c: rational(v, s.den) });
    });
    hits.sort((a, b) => norm(a.halves) - norm(b.halves) || lexCompare(a.halves, b.halves));
    if (hits.length > 0) return hits[0]!;
  }
  return null;
}


function offendingRecord(o: Offending): MismatchRecord {
  return { q: rationalToString(o.q), zeta: o.halves.map((h) => rationalToString(rat(h, 2))), left: rationalToString(o.c), right: '0' };
}

function why(p: Holomorphy, nvars: number): string {
  if (p === 'weak') return 'a coefficient with a negative q-exponent';
  const disc = nvars === 1 ? '4mx − r²' : 'x − ¼ℓᵀM⁻¹ℓ';
  return `a coefficient with ${disc} ${p === 'holomorphic' ? '<' : '≤'} 0`;
}

export function checkAssertion(expr: Expr, spec: TypeSpec, ctx: EvalContext, opts: CheckOptions): Outcome {
  const nvars = ctx.variables.length;
  const declared = typeFromSpec(spec, nvars, ctx.lattices);
  const m = evaluate(expr, ctx);
  if (isZeroMonomial(m)) return { verdict: 'proved', type: typeRecord(declared, 'modular'), reason: 'the zero function has every type' };
  const cls = monomialClass(m);
  const inferred = monomialType(m, nvars)!;
  const type = typeRecord(inferred, cls);
  if (cls === 'quasi') {
    return { verdict: 'unproved', type, reason: `no proven type: ${quasiReasons(m).join('; ')}` };
  }
  if (!typesEqual(inferred, declared)) {
    if (isIdenticallyZero(m, nvars)) return { verdict: 'proved', type, reason: 'the expression vanishes identically, so it has every type' };
    return {
      verdict: 'refuted',
      type,
      reason: `the type is ${formatType(inferred)}, not ${formatType(declared)} (${typeDifferences(inferred, declared).join('; ')}), and the expression is not identically zero`,
    };
  }
  if (cls === 'meromorphic') return meromorphicAssertion(m, opts, nvars);
  const property = spec.qualifier;
  if (property === null) {
    return { verdict: 'proved', type, reason: `${formatType(declared)} by the type rules; holomorphic on H × C by construction` };
  }
  const decides = criterion(property, inferred);
  if (decides === null) return { verdict: 'unproved', type, reason: `${property}: deciding it needs a positive definite index` };
  const norm = zetaNormFor(inferred);
  for (const p of property === 'weak' ? (['weak'] as const) : (['weak', property] as const)) {
    const bad = firstForbidden(m, p, p === property ? decides : criterion('weak', inferred)!, norm);
    if (bad !== null) {
      return { verdict: 'refuted', type, mismatch: offendingRecord(bad), reason: `not ${property}: ${why(p, nvars)} is non-zero` };
    }
  }
  return {
    verdict: 'proved',
    type,
    reason: `${property}: every coefficient it forbids vanishes, decided by those with ${decides.describe}`,
  };
}

/** N/Q with Q not a theta block: an exact slice division that fails proves a pole. */
function meromorphicAssertion(m: Monomial, opts: CheckOptions, nvars: number): Outcome {
  const { N, Q } = numeratorAndDenominator(m);
  const type = typeRecord(monomialType(m, nvars), 'meromorphic');
  const qs = numeratorSource(Q);
  const X = radd(rmax(boundOfType(monomialType(N, nvars)!), rat(0)), rat(opts.depth));
  const qSeries = qs.expand(radd(X, qs.valuation));
  const lead = qSeries.slices.find((s) => !sliceIsZero(s));
  const monic = JSBI.equal(qSeries.den, ONE) && lead !== undefined && hasUnitLead(lead);
  if (!monic) return { verdict: 'unproved', type, reason: 'a quotient by a non-unit: its holomorphy is not proven' };
  const g = divideExact(numeratorSource(N).expand(radd(X, qs.valuation)), qSeries);
  if (g === null) {
    return { verdict: 'refuted', type, reason: 'the quotient does not divide exactly slice by slice: it has a pole in z' };
  }
  return {
    verdict: 'unproved',
    type,
    reason: `a quotient by a non-unit: it divides exactly up to ${powerText('q', X, false)}, but holomorphy is not proven`,
  };
}
