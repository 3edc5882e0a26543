/**
 * A claim `L == R` (MATH.md §4, §6): normalise to F = 0, take the bound of Theorem A
 * from F's type, expand both sides of F exactly to it and compare; then compare a
 * margin beyond the bound, where any difference means a wrong type rule or a false
 * assumption (an error, never a proof). Quasi-modular claims are compared to the
 * nominal bound plus `depth` q-steps and are at best unproved.
 */
import { type Rational, rat, radd, rmin, rationalToString, powerText, seriesOfResidues } from '../series/index.js';
import type { Expr } from '../lang/ast.js';
import { type ModularType, typesEqual, typeDifferences, type FormClass } from '../types/index.js';
import type { ComparisonEvidence, FactorRecord, MismatchRecord, ModularRouteRecord, TypeRecord } from '../verdict/index.js';
import type { Monomial, AtomPower } from './atom.js';
import { evaluate, type EvalContext } from './evaluate.js';
import { atomMonomial, monomialText, sortedFactors, multiplyMonomials, powerMonomial, ONE_MONOMIAL, isZeroMonomial } from './monomial.js';
import { splitMonomial, monomialType, monomialClass, quasiReasons } from './monomial-parts.js';
import { numeratorSource } from './monomial-source.js';
import { compareTo, type Comparison, type Mismatch } from './compare-series.js';
import { modularSides, compareResiduesTo } from './compare-residues.js';
import { isIdenticallyZero } from './side-zero.js';
import { boundFor } from './bound-of-type.js';
import { MODULAR_MIN_TERMS, MODULAR_MAX_PRIMES } from './route-choice.js';
import { estimateTermsForType } from './estimate.js';
import { zetaNormFor } from './zeta-norm.js';
import type { CheckOptions } from './check-options.js';
import type { Outcome } from './outcome.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';
import { typeRecord } from './type-record.js';
import { comparisonEvidence } from './comparison-evidence.js';
import { boundParameters } from './bound-parameters.js';

interface NormalForm {
  readonly left: Monomial;
  readonly right: Monomial;
  readonly leftBy: Monomial;
  readonly rightBy: Monomial;
  readonly crossMultiplied: boolean;
}

function product(powers: Iterable<AtomPower>): Monomial {
  let m = ONE_MONOMIAL;
  for (const p of powers) m = multiplyMonomials(m, powerMonomial(atomMonomial(p.atom), p.exponent));
  return m;
}

/**
 * F = N_L·Q_R′ − N_R·Q_L′ with Q′ the denominators after cancelling the factors they
 * share (structurally identical atoms only, MATH.md §4 step 2).
 */
export function normalForm(l: Monomial, r: Monomial): NormalForm {
  const ql = new Map(splitMonomial(l).denominator.map((p) => [p.atom.key, p]));
  const qr = new Map(splitMonomial(r).denominator.map((p) => [p.atom.key, p]));
  if (ql.size === 0 && qr.size === 0) return { left: l, right: r, leftBy: ONE_MONOMIAL, rightBy: ONE_MONOMIAL, crossMultiplied: false };
  const qlAll = product(ql.values());
  const qrAll = product(qr.values());
  const common: AtomPower[] = [];
  for (const [k, p] of ql) {
    const o = qr.get(k);
    if (o !== undefined) common.push({ atom: p.atom, exponent: Math.min(p.exponent, o.exponent) });
  }
  const shared = product(common);
  const leftBy = multiplyMonomials(qrAll, powerMonomial(shared, -1));
  const rightBy = multiplyMonomials(qlAll, powerMonomial(shared, -1));
  return {
    left: multiplyMonomials(l, multiplyMonomials(qlAll, leftBy)),
    right: multiplyMonomials(r, multiplyMonomials(qrAll, rightBy)),
    leftBy,
    rightBy,
    crossMultiplied: true,
  };
}

function mismatchRecord(m: Mismatch): MismatchRecord {
  return {
    q: rationalToString(m.q),
    zeta: m.zetaHalves.map((h) => rationalToString(rat(h, 2))),
    left: rationalToString(m.left),
    right: rationalToString(m.right),
  };
}

/** Each factor of a side of F with the type the rules give it (certificates list them). */
function factorRecords(m: Monomial): FactorRecord[] {
  return sortedFactors(m).map((p) => ({ atom: p.atom.key, exponent: p.exponent, type: typeRecord(p.atom.type, p.atom.cls) }));
}

function worstClass(a: FormClass, b: FormClass): FormClass {
  if (a === 'quasi' || b === 'quasi') return 'quasi';
  return a === 'meromorphic' || b === 'meromorphic' ? 'meromorphic' : 'modular';
}


/** Both sides of F expanded to one q-order, compared at any order up to it. */
interface ExpandedSides {
  compare(X: Rational): Comparison;
  evidence(X: Rational, mismatch: Mismatch | null): ComparisonEvidence;
  readonly route?: ModularRouteRecord;
}

function expandBoth(nf: NormalForm, t: ModularType, X: Rational, nvars: number, opts: CheckOptions): ExpandedSides {
  const ls = numeratorSource(nf.left);
  const rs = numeratorSource(nf.right);
  const v = rmin(ls.valuation, rs.valuation);
  const estimate = estimateTermsForType(t, v, X);
  if (estimate > opts.maxTerms) {
    throw evalError(evalCodes.tooManyTerms, { estimate: Math.ceil(estimate).toExponential(2), limit: opts.maxTerms }, null);
  }
  const norm = zetaNormFor(t);
  const mode = opts.arithmetic ?? 'auto';
  const modular = nvars === 1 && (mode === 'modular' || (mode === 'auto' && estimate >= MODULAR_MIN_TERMS));
  const sides = modular ? modularSides(ls, rs, X, mode === 'modular' ? Infinity : MODULAR_MAX_PRIMES) : null;
  if (sides !== null) {
    return {
      compare: (Y) => compareResiduesTo(sides, Y, norm),
      evidence: (Y, m) => comparisonEvidence(seriesOfResidues(sides.left, sides.leftMajorant.den), seriesOfResidues(sides.right, sides.rightMajorant.den), Y, norm, m),
      route: sides.route,
    };
  }
  const a = ls.expand(X);
  const b = rs.expand(X);
  return { compare: (Y) => compareTo(a, b, Y, norm), evidence: (Y, m) => comparisonEvidence(a, b, Y, norm, m) };
}

export function checkIdentity(left: Expr, right: Expr, ctx: EvalContext, opts: CheckOptions): Outcome {
  const nvars = ctx.variables.length;
  const l = evaluate(left, ctx);
  const r = evaluate(right, ctx);
  const tl = monomialType(l, nvars);
  const tr = monomialType(r, nvars);
  const cl = monomialClass(l);
  const cr = monomialClass(r);
  const quasi = cl === 'quasi' || cr === 'quasi';
  const cls = worstClass(cl, cr);
  if (!quasi && tl !== null && tr !== null && !typesEqual(tl, tr)) {
    return differentTypes(l, r, tl, tr, cl, cr, nvars);
  }
  const nf = normalForm(l, r);
  const compared = nf.crossMultiplied ? 'cross-multiplied' : 'sides';
  let tF = monomialType(nf.left, nvars) ?? monomialType(nf.right, nvars);
  const claimType: TypeRecord = typeRecord(tl ?? tr, cls);
  const normal = {
    compared,
    left: monomialText(nf.left),
    right: monomialText(nf.right),
    ...(nf.crossMultiplied ? { leftMultipliedBy: monomialText(nf.leftBy), rightMultipliedBy: monomialText(nf.rightBy) } : {}),
    type: typeRecord(tF, quasi ? 'quasi' : 'modular'),
    leftCoefficient: rationalToString(nf.left.coefficient),
    leftFactors: factorRecords(nf.left),
    rightCoefficient: rationalToString(nf.right.coefficient),
    rightFactors: factorRecords(nf.right),
  } as const;
  if (tF === null || (isZeroMonomial(nf.left) && isZeroMonomial(nf.right))) {
    return { verdict: 'proved', type: claimType, compared, normalForm: normal, reason: 'both sides are the literal 0' };
  }
  if (opts.adjustTypeForTest) tF = opts.adjustTypeForTest(tF);
  const { qOrder: X, derivation, theorem } = boundFor(tF);
  if (quasi) {
    const to = radd(X, rat(opts.depth));
    const sides = expandBoth(nf, tF, to, nvars, opts);
    const c = sides.compare(to);
    const evidence = withEvidence(opts, () => sides.evidence(to, c.mismatch));
    const reasons = [...new Set([...quasiReasons(l), ...quasiReasons(r)])].join('; ');
    if (c.mismatch !== null) {
      return { verdict: 'refuted', type: claimType, compared, normalForm: normal, ...evidence, mismatch: mismatchRecord(c.mismatch), ...routeOf(sides), reason: `the expansions differ (${reasons}; compared to the nominal bound plus ${opts.depth} q-steps)` };
    }
    return {
      verdict: 'unproved',
      type: claimType,
      compared,
      normalForm: normal,
      ...evidence,
      ...routeOf(sides),
      reason: `no proven type: ${reasons}; the coefficients agree up to ${powerText('q', to, false)} (${c.compared} non-zero coefficients compared; nominal bound ${powerText('q', X, false)} plus ${opts.depth} q-steps)`,
    };
  }
  const marginTo = radd(X, rat(opts.margin));
  const sides = expandBoth(nf, tF, marginTo, nvars, opts);
  const c = sides.compare(X);
  const evidence = withEvidence(opts, () => sides.evidence(X, c.mismatch));
  if (c.mismatch !== null) {
    return { verdict: 'refuted', type: claimType, compared, normalForm: normal, ...evidence, mismatch: mismatchRecord(c.mismatch), ...routeOf(sides), reason: 'a coefficient inside the bound differs' };
  }
  const margin = sides.compare(marginTo);
  if (margin.mismatch !== null) return marginFailure(ctx, margin.mismatch, marginTo);
  return {
    verdict: 'proved',
    type: claimType,
    compared,
    normalForm: normal,
    ...evidence,
    bound: {
      theorem,
      qOrder: rationalToString(X),
      coefficientsChecked: c.compared,
      derivation,
      marginTo: rationalToString(marginTo),
      ...(opts.evidence === true ? { parameters: boundParameters(tF) } : {}),
    },
    ...routeOf(sides),
  };
}

function routeOf(sides: ExpandedSides): { route?: ModularRouteRecord } {
  return sides.route === undefined ? {} : { route: sides.route };
}

/** `{ evidence }` when the run records evidence, `{}` otherwise (the work is skipped). */
function withEvidence(opts: CheckOptions, make: () => ComparisonEvidence): { evidence?: ComparisonEvidence } {
  return opts.evidence === true ? { evidence: make() } : {};
}

function marginFailure(ctx: EvalContext, m: Mismatch, marginTo: Rational): Outcome {
  const where = `${powerText('q', m.q, false)} ${m.zetaHalves.map((h, i) => powerText(m.zetaHalves.length === 1 ? 'ζ' : `ζ${i + 1}`, rat(h, 2), false)).join(' ')}`;
  if (ctx.usedAssumptions.size > 0) {
    return {
      verdict: 'error',
      reason: `assumption ${[...ctx.usedAssumptions].join(', ')} is false: the sides agree inside the bound but differ at ${where}, inside the margin (to ${powerText('q', marginTo, false)})`,
      mismatch: mismatchRecord(m),
    };
  }
  return {
    verdict: 'error',
    reason: `internal error: the sides agree inside the bound but differ at ${where}, inside the margin (to ${powerText('q', marginTo, false)}); a type rule is wrong — please report this claim`,
    mismatch: mismatchRecord(m),
  };
}

function differentTypes(l: Monomial, r: Monomial, tl: ModularType, tr: ModularType, cl: FormClass, cr: FormClass, nvars: number): Outcome {
  const zl = isIdenticallyZero(l, nvars);
  const zr = isIdenticallyZero(r, nvars);
  if (zl && zr) {
    return { verdict: 'proved', type: typeRecord(tl, cl), reason: 'both sides vanish identically (each checked to its own bound)' };
  }
  return {
    verdict: 'refuted',
    type: typeRecord(tl, worstClass(cl, cr)),
    leftType: typeRecord(tl, cl),
    rightType: typeRecord(tr, cr),
    reason: `the sides have different types (${typeDifferences(tl, tr).join('; ')}) and ${zl ? 'the right side is not' : zr ? 'the left side is not' : 'neither side is'} identically zero`,
  };
}
