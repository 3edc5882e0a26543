/**
 * The generic substitution z ↦ a·z of an atom through its series (ζ ↦ ζ^a), for atoms
 * with no structural rule (E_{k,1}, named forms, derivatives, restricted blocks).
 * Index becomes a²·m (MATH.md §3); a = 0 gives index 0 and may vanish, so the
 * valuation is then only a lower bound.
 */
import { mapSource, substituteZeta } from '../series/index.js';
import { typeSubstitute } from '../types/index.js';
import type { Atom, Monomial } from './atom.js';
import { atomMonomial } from './monomial.js';

export function linearFormText(a: number, variable = 'z'): string {
  if (a === 0) return '0';
  if (a === 1) return variable;
  if (a === -1) return `-${variable}`;
  return `${a}${variable}`;
}

export function substitutedAtom(atom: Atom, a: number): Atom {
  const key = `${atom.key}(${linearFormText(a)})`;
  const self: Atom = {
    key,
    kind: 'other',
    type: typeSubstitute(atom.type, [[a]]),
    cls: atom.cls,
    quasiReason: atom.quasiReason,
    source: mapSource(atom.source, (s) => substituteZeta(s, a)),
    valuationExact: atom.valuationExact && a !== 0,
    thetaA: null,
    substitute: (b: number): Monomial => atomMonomial(substitutedAtom(atom, a * b)),
  };
  return self;
}
