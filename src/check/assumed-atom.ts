/**
 * `assume NAME is TYPE` (CLAIMS.md): a quasi-modular definition whose type by the rules
 * equals TYPE is treated as a form of that type. The claim's verdict then says
 * "proved, assuming …", and the margin check (MATH.md §6) turns a false assumption
 * into an error.
 */
import type { Span } from '../lang/span.js';
import { type ModularType, typesEqual, typeDifferences, formatType } from '../types/index.js';
import type { Atom, Monomial } from './atom.js';
import { atomMonomial } from './monomial.js';
import { splitMonomial, monomialType, monomialClass } from './monomial-parts.js';
import { numeratorSource } from './monomial-source.js';
import { substitutedAtom } from './substituted-atom.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

export function assumedMonomial(name: string, value: Monomial, declared: ModularType, nvars: number, span: Span): Monomial {
  const cls = monomialClass(value);
  if (cls !== 'quasi') throw evalError(evalCodes.assumeNotQuasi, { name, cls }, span);
  const den = splitMonomial(value).denominator;
  if (den.length > 0) {
    throw evalError(evalCodes.assumeMeromorphic, { name, denominator: den.map((p) => p.atom.key).join('*') }, span);
  }
  const inferred = monomialType(value, nvars);
  if (inferred !== null && !typesEqual(inferred, declared)) {
    throw evalError(
      evalCodes.assumeTypeMismatch,
      { name, inferred: formatType(inferred), declared: formatType(declared), differences: typeDifferences(inferred, declared).join('; ') },
      span,
    );
  }
  const atom: Atom = {
    key: name,
    kind: 'other',
    type: declared,
    cls: 'modular',
    quasiReason: null,
    source: numeratorSource(value),
    valuationExact: false,
    thetaL: null,
    substitute: (A: readonly (readonly number[])[]): Monomial => atomMonomial(substitutedAtom(atom, A)),
  };
  return atomMonomial(atom);
}
