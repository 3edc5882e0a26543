/**
 * z ↦ a·z applied to a monomial, atom by atom (so cancellation stays structural).
 * A holomorphic theta block restricted to z = 0 goes through its series instead:
 * ϑ(2z)/ϑ(z) at z = 0 is the value of a holomorphic function, while restricting its
 * factors would give 0/0 (MATH.md §3). A divisor that becomes identically zero is a
 * division by zero.
 */
import { mapSource, substituteZeta, rat } from '../series/index.js';
import type { Span } from '../lang/span.js';
import { typeSubstitute, constantType, typeProduct, typePower } from '../types/index.js';
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
import { linearFormText } from './substituted-atom.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

function restrictedBlockAtom(block: readonly AtomPower[]): Atom {
  let t = constantType(1);
  for (const p of block) t = typeProduct(t, typePower(p.atom.type, p.exponent));
  const inner = shapeKey({ coefficient: rat(1), factors: new Map(block.map((p) => [p.atom.key, p])) });
  const atom: Atom = {
    key: `(${inner})(0)`,
    kind: 'other',
    type: typeSubstitute(t, [[0]]),
    cls: 'modular',
    quasiReason: null,
    source: mapSource(thetaBlockSource(block), (s) => substituteZeta(s, 0)),
    valuationExact: false,
    thetaA: null,
    substitute: (): Monomial => atomMonomial(atom),
  };
  return atom;
}

export function substituteMonomial(m: Monomial, a: number, span: Span | null): Monomial {
  if (a === 1 || isZeroMonomial(m)) return m;
  const parts = splitMonomial(m);
  let out = constantMonomial(m.coefficient);
  let factors: AtomPower[] = [...m.factors.values()];
  if (a === 0 && parts.thetaBlock.length > 0) {
    out = multiplyMonomials(out, atomMonomial(restrictedBlockAtom(parts.thetaBlock)));
    const inBlock = new Set(parts.thetaBlock.map((p) => p.atom.key));
    factors = factors.filter((p) => !inBlock.has(p.atom.key));
  }
  for (const p of factors) {
    const sub = p.atom.substitute(a);
    if (p.exponent < 0 && isZeroMonomial(sub)) {
      throw evalError(evalCodes.divisionByZero, { what: `${p.atom.key} at z = ${linearFormText(a)}` }, span);
    }
    out = multiplyMonomials(out, powerMonomial(sub, p.exponent));
  }
  return out;
}
