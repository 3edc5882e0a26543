/**
 * Bare derivatives D_q = q d/dq and D_ζ = ζ d/dζ (MATH.md §1): quasi-modular atoms
 * (MATH.md §5) with the nominal type of the rules (D_q adds weight 2, D_ζ adds 1;
 * CLAIMS.md, `assume`). Their input must be holomorphic: on a quotient N/Q the
 * quotient rule would be needed, which is not built.
 */
import { mapSource, derivativeQ, derivativeZeta, rat, radd } from '../series/index.js';
import type { Span } from '../lang/span.js';
import type { Atom, Monomial } from './atom.js';
import { atomMonomial, isConstant, isZeroMonomial, monomialText, ZERO_MONOMIAL } from './monomial.js';
import { splitMonomial, monomialType, quasiReasons } from './monomial-parts.js';
import { numeratorSource } from './monomial-source.js';
import { substitutedAtom } from './substituted-atom.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

export function derivativeMonomial(op: 'Dq' | 'Dz', m: Monomial, nvars: number, span: Span | null): Monomial {
  if (isZeroMonomial(m) || isConstant(m)) return ZERO_MONOMIAL;
  const parts = splitMonomial(m);
  if (parts.denominator.length > 0) {
    throw evalError(evalCodes.meromorphicInput, { what: op, denominator: parts.denominator.map((p) => p.atom.key).join('*') }, span);
  }
  const t = monomialType(m, nvars)!;
  const inner = monomialText(m);
  const reason = `${op}(${inner}) is a bare derivative, quasi-modular`;
  const base = numeratorSource(m, parts);
  const atom: Atom = {
    key: `${op}(${inner})`,
    kind: 'other',
    type: { ...t, weight: radd(t.weight, rat(op === 'Dq' ? 2 : 1)) },
    cls: 'quasi',
    quasiReason: [reason, ...quasiReasons(m)].join('; '),
    source: mapSource(base, op === 'Dq' ? derivativeQ : derivativeZeta),
    valuationExact: false,
    thetaL: null,
    substitute: (A: readonly (readonly number[])[]): Monomial => atomMonomial(substitutedAtom(atom, A)),
  };
  return atomMonomial(atom);
}
