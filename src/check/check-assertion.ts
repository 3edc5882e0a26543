/**
 * A claim `E is TYPE [weak|holomorphic|cusp]` (CLAIMS.md, MATH.md §4 item 4, §6).
 * The type comes from the rules; the qualifier is decided by the coefficients that
 * MATH.md §6 names. A quotient by a non-unit that is not a theta block: a failed exact
 * slice division proves a pole (refuted); otherwise the assertion stays unproved.
 */
import { type Rational, rat, radd, rcmp, rmax, rationalToString, divideExact, JSBI, ONE, isZero, sliceExponent, rational, powerText, dense, sliceIsZero, hasUnitLead } from '../series/index.js';
import type { Expr, TypeSpec } from '../lang/ast.js';
import { typesEqual, typeDifferences, formatType, scalarIndexOf, mustVanish, holomorphyOrder, type Holomorphy } from '../types/index.js';
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
  readonly halves: number;
  readonly c: Rational;
}

/** The first coefficient (q, then |ℓ|, then ℓ) that the property forbids, if any. */
function firstForbidden(m: Monomial, property: Holomorphy, index: Rational): Offending | null {
  const src = numeratorSource(m);
  const X = holomorphyOrder(property, index);
  if (rcmp(src.valuation, rat(0)) >= 0 && property === 'weak') return null;
  if (rcmp(X, src.valuation) < 0) return null;
  const s = src.expand(X);
  for (let i = 0; i < s.slices.length; i++) {
    const sl = dense(s.slices[i]!);
    const q = sliceExponent(s, i);
    const hits: Offending[] = [];
    sl.c.forEach((v, k) => {
      const halves = sl.lo + k;
      const r = rat(halves, 2);
      const inRange = property === 'weak' || rcmp(rmax(r, rat(-halves, 2)), index) <= 0;
      if (!isZero(v) && inRange && mustVanish(property, q, r, index)) hits.push({ q, halves, c: rational(v, s.den) });
    });
    hits.sort((a, b) => Math.abs(a.halves) - Math.abs(b.halves) || a.halves - b.halves);
    if (hits.length > 0) return hits[0]!;
  }
  return null;
}

function offendingRecord(o: Offending): MismatchRecord {
  return { q: rationalToString(o.q), zeta: [rationalToString(rat(o.halves, 2))], left: rationalToString(o.c), right: '0' };
}

const WHY: Readonly<Record<Holomorphy, string>> = {
  weak: 'a negative q-exponent',
  holomorphic: 'a coefficient with 4mx − r² < 0',
  cusp: 'a coefficient with 4mx − r² ≤ 0',
};

export function checkAssertion(expr: Expr, spec: TypeSpec, ctx: EvalContext, opts: CheckOptions): Outcome {
  const nvars = ctx.variables.length;
  const declared = typeFromSpec(spec, nvars);
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
  if (cls === 'meromorphic') return meromorphicAssertion(m, opts);
  const property = spec.qualifier;
  if (property === null) {
    return { verdict: 'proved', type, reason: `${formatType(declared)} by the type rules (MATH.md §3); holomorphic on H × C by construction` };
  }
  const index = scalarIndexOf(inferred);
  for (const p of property === 'weak' ? (['weak'] as const) : (['weak', property] as const)) {
    const bad = firstForbidden(m, p, index);
    if (bad !== null) {
      return { verdict: 'refuted', type, mismatch: offendingRecord(bad), reason: `not ${property}: ${WHY[p]} has a non-zero coefficient` };
    }
  }
  return {
    verdict: 'proved',
    type,
    reason: `${property}: every coefficient it forbids vanishes, decided by those with x ≤ ${rationalToString(holomorphyOrder(property, index))} and |r| ≤ m (MATH.md §6)`,
  };
}

/** N/Q with Q not a theta block: an exact slice division that fails proves a pole. */
function meromorphicAssertion(m: Monomial, opts: CheckOptions): Outcome {
  const { N, Q } = numeratorAndDenominator(m);
  const type = typeRecord(monomialType(m, 1), 'meromorphic');
  const qs = numeratorSource(Q);
  const X = radd(rmax(boundOfType(monomialType(N, 1)!), rat(0)), rat(opts.depth));
  const qSeries = qs.expand(radd(X, qs.valuation));
  const lead = qSeries.slices.find((s) => !sliceIsZero(s));
  const monic = JSBI.equal(qSeries.den, ONE) && lead !== undefined && hasUnitLead(lead);
  if (!monic) return { verdict: 'unproved', type, reason: 'a quotient by a non-unit: its holomorphy is not proven (MATH.md §4)' };
  const g = divideExact(numeratorSource(N).expand(radd(X, qs.valuation)), qSeries);
  if (g === null) {
    return { verdict: 'refuted', type, reason: 'the quotient does not divide exactly slice by slice: it has a pole in z (MATH.md §4, item 4)' };
  }
  return {
    verdict: 'unproved',
    type,
    reason: `a quotient by a non-unit: it divides exactly up to ${powerText('q', X, false)}, but holomorphy is not proven (MATH.md §4)`,
  };
}
