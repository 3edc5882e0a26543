/**
 * Sums (MATH.md §3–4). Like terms are combined; every remaining term must have the
 * same type (the class takes no part), else the sum is ill-typed and the error names
 * both terms, their types and how they differ. Meromorphic terms are brought to a
 * common denominator Q (a multiset of atoms, each with its largest multiplicity), so
 * the sum becomes one holomorphic *sum atom* over Q.
 */
import { type SeriesSource, rat, radd, rIsZero, sumSource, rmin } from '../series/index.js';
import type { Span } from '../lang/span.js';
import { typesEqual, typeDifferences, formatType, type ModularType } from '../types/index.js';
import type { Atom, AtomPower, Monomial } from './atom.js';
import {
  ZERO_MONOMIAL,
  atomMonomial,
  multiplyMonomials,
  powerMonomial,
  shapeKey,
  monomialText,
} from './monomial.js';
import { splitMonomial, monomialType, quasiReasons } from './monomial-parts.js';
import { numeratorSource } from './monomial-source.js';
import { substituteMonomial } from './substitute-monomial.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

export interface SumTerm {
  readonly monomial: Monomial;
  /** Source text of the term, for error messages. */
  readonly text: string;
}

function combineLikeTerms(terms: readonly Monomial[]): Monomial[] {
  const byShape = new Map<string, Monomial>();
  for (const t of terms) {
    if (rIsZero(t.coefficient)) continue;
    const k = shapeKey(t);
    const prev = byShape.get(k);
    byShape.set(k, prev === undefined ? t : { coefficient: radd(prev.coefficient, t.coefficient), factors: t.factors });
  }
  return [...byShape.values()].filter((t) => !rIsZero(t.coefficient));
}

function checkTypes(terms: readonly SumTerm[], nvars: number, span: Span | null): void {
  let first: { term: SumTerm; type: ModularType } | null = null;
  for (const term of terms) {
    const t = monomialType(term.monomial, nvars);
    if (t === null) continue;
    if (first === null) {
      first = { term, type: t };
      continue;
    }
    if (!typesEqual(first.type, t)) {
      throw evalError(
        evalCodes.illTypedSum,
        {
          left: `'${first.term.text}'`,
          leftType: formatType(first.type),
          right: `'${term.text}'`,
          rightType: formatType(t),
          differences: typeDifferences(first.type, t).join('; '),
        },
        span,
      );
    }
  }
}

/** The least common multiple of the terms' denominators, as a monomial. */
function commonDenominator(terms: readonly Monomial[]): Monomial {
  const q = new Map<string, AtomPower>();
  for (const t of terms) {
    for (const p of splitMonomial(t).denominator) {
      const prev = q.get(p.atom.key);
      if (prev === undefined || prev.exponent < p.exponent) q.set(p.atom.key, p);
    }
  }
  return { coefficient: rat(1), factors: q };
}

function sumAtom(numerators: readonly Monomial[], nvars: number): Atom {
  const sorted = [...numerators].sort((a, b) => (monomialText(a) < monomialText(b) ? -1 : 1));
  const key = `(${sorted.map(monomialText).join(' + ')})`;
  const sources: SeriesSource[] = sorted.map((m) => numeratorSource(m));
  let v = sources[0]!.valuation;
  for (const s of sources) v = rmin(v, s.valuation);
  const summed = sumSource(sources.map((source) => ({ source, coefficient: rat(1) })));
  const reasons = [...new Set(sorted.flatMap(quasiReasons))];
  const atom: Atom = {
    key,
    kind: 'other',
    type: monomialType(sorted[0]!, nvars)!,
    cls: reasons.length > 0 ? 'quasi' : 'modular',
    quasiReason: reasons.length > 0 ? reasons.join('; ') : null,
    source: { valuation: v, expand: (X) => summed.expand(X) },
    valuationExact: false,
    thetaL: null,
    substitute: (A: readonly (readonly number[])[]): Monomial =>
      sumMonomials(
        sorted.map((m) => ({ monomial: substituteMonomial(m, A, null), text: monomialText(m) })),
        A[0]!.length,
        null,
      ),
  };
  return atom;
}

export function sumMonomials(terms: readonly SumTerm[], nvars: number, span: Span | null): Monomial {
  checkTypes(terms, nvars, span);
  const combined = combineLikeTerms(terms.map((t) => t.monomial));
  if (combined.length === 0) return ZERO_MONOMIAL;
  if (combined.length === 1) return combined[0]!;
  const Q = commonDenominator(combined);
  const numerators = combined.map((t) => multiplyMonomials(t, Q));
  return multiplyMonomials(atomMonomial(sumAtom(numerators, nvars)), powerMonomial(Q, -1));
}

