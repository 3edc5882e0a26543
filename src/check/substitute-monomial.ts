/**
 * z ↦ a·z applied to a monomial, atom by atom (so cancellation stays structural).
 * A holomorphic theta block restricted to z = 0 goes through its series instead:
 * ϑ(2z)/ϑ(z) at z = 0 is the value of a holomorphic function, while restricting its
 * factors would give 0/0 (MATH.md §3). A divisor that becomes identically zero is a
 * division by zero.
 */
import { rat } from '../series/index.js';
import type { Span } from '../lang/span.js';
import { constantType, typeProduct, typePower } from '../types/index.js';
import type { Atom, AtomPower, Monomial } from './atom.js';
import {
  atomMonomial,
  constantMonomial,
  multiplyMonomials,
  powerMonomial,
  isZeroMonomial,
  shapeKey,
} from './monomial.js';
import { splitMonomial } from './monomial-parts.js';
import { thetaBlockSource } from './monomial-source.js';
import { substitutedAtom, substitutionText, isIdentity, type IntMatrix } from './substituted-atom.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

/** A holomorphic theta block pulled back through its series (its factors would give 0/0). */
function pulledBackBlockAtom(block: readonly AtomPower[], A: IntMatrix): Atom {
  let t = constantType(A.length);
  for (const p of block) t = typeProduct(t, typePower(p.atom.type, p.exponent));
  const inner = shapeKey({ coefficient: rat(1), factors: new Map(block.map((p) => [p.atom.key, p])) });
  const base: Atom = {
    key: `(${inner})`,
    kind: 'other',
    type: t,
    cls: 'modular',
    quasiReason: null,
    source: thetaBlockSource(block),
    valuationExact: false,
    thetaL: null,
    substitute: (B: IntMatrix): Monomial => atomMonomial(substitutedAtom(base, B)),
  };
  return substitutedAtom(base, A);
}

/** Whether some divisor ϑ(ℓ·z) of the block becomes ϑ(0) = 0 under w = A·z. */
function blockDivisorVanishes(block: readonly AtomPower[], A: IntMatrix): boolean {
  return block.some((p) => p.exponent < 0 && A[0]!.every((_, j) => p.atom.thetaL!.reduce((s, x, i) => s + x * A[i]![j]!, 0) === 0));
}

/** The monomial after the substitution w = A·z of its variables (one variable: [[a]]). */
export function substituteMonomial(m: Monomial, A: IntMatrix, span: Span | null): Monomial {
  if (isIdentity(A) || isZeroMonomial(m)) return m;
  const parts = splitMonomial(m);
  let out = constantMonomial(m.coefficient);
  let factors: AtomPower[] = [...m.factors.values()];
  if (parts.thetaBlock.length > 0 && blockDivisorVanishes(parts.thetaBlock, A)) {
    out = multiplyMonomials(out, atomMonomial(pulledBackBlockAtom(parts.thetaBlock, A)));
    const inBlock = new Set(parts.thetaBlock.map((p) => p.atom.key));
    factors = factors.filter((p) => !inBlock.has(p.atom.key));
  }
  for (const p of factors) {
    const sub = p.atom.substitute(A);
    if (p.exponent < 0 && isZeroMonomial(sub)) {
      throw evalError(evalCodes.divisionByZero, { what: `${p.atom.key} under (${substitutionText(A)})` }, span);
    }
    out = multiplyMonomials(out, powerMonomial(sub, p.exponent));
  }
  return out;
}
