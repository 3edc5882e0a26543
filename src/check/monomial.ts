/** Arithmetic of monomials c·Π atom^e (MATH.md §4: structural products and quotients). */
import { type Rational, rat, rmul, rpow, rIsZero, rationalToString, RONE } from '../series/index.js';
import type { Atom, AtomPower, Monomial } from './atom.js';

export const ZERO_MONOMIAL: Monomial = { coefficient: rat(0), factors: new Map() };
export const ONE_MONOMIAL: Monomial = { coefficient: RONE, factors: new Map() };

export function constantMonomial(c: Rational): Monomial {
  return { coefficient: c, factors: new Map() };
}

export function atomMonomial(atom: Atom, exponent = 1, coefficient: Rational = RONE): Monomial {
  return { coefficient, factors: new Map([[atom.key, { atom, exponent }]]) };
}

export function isZeroMonomial(m: Monomial): boolean {
  return rIsZero(m.coefficient);
}

export function isConstant(m: Monomial): boolean {
  return m.factors.size === 0;
}

export function multiplyMonomials(a: Monomial, b: Monomial): Monomial {
  if (isZeroMonomial(a) || isZeroMonomial(b)) return ZERO_MONOMIAL;
  const factors = new Map(a.factors);
  for (const [k, p] of b.factors) {
    const e = (factors.get(k)?.exponent ?? 0) + p.exponent;
    if (e === 0) factors.delete(k);
    else factors.set(k, { atom: p.atom, exponent: e });
  }
  return { coefficient: rmul(a.coefficient, b.coefficient), factors };
}

/** m^e for an integer e; the caller rejects 0^e with e < 0. */
export function powerMonomial(m: Monomial, e: number): Monomial {
  if (e === 0) return ONE_MONOMIAL;
  if (isZeroMonomial(m)) return ZERO_MONOMIAL;
  const factors = new Map<string, AtomPower>();
  for (const [k, p] of m.factors) factors.set(k, { atom: p.atom, exponent: p.exponent * e });
  return { coefficient: rpow(m.coefficient, e), factors };
}

export function divideMonomials(a: Monomial, b: Monomial): Monomial {
  return multiplyMonomials(a, powerMonomial(b, -1));
}

export function scaleMonomial(m: Monomial, c: Rational): Monomial {
  return rIsZero(c) ? ZERO_MONOMIAL : { coefficient: rmul(m.coefficient, c), factors: m.factors };
}

/** Factors sorted by key: the canonical order for keys and printing. */
export function sortedFactors(m: Monomial): AtomPower[] {
  return [...m.factors.values()].sort((x, y) => (x.atom.key < y.atom.key ? -1 : x.atom.key > y.atom.key ? 1 : 0));
}

/** The canonical key of the atom part (coefficient excluded): like terms share it. */
export function shapeKey(m: Monomial): string {
  return sortedFactors(m)
    .map((p) => (p.exponent === 1 ? p.atom.key : `${p.atom.key}^${p.exponent}`))
    .join('*');
}

/** Readable text, e.g. `12*E_4^2*theta(z)^-2`. */
export function monomialText(m: Monomial): string {
  const shape = shapeKey(m);
  const c = rationalToString(m.coefficient);
  if (shape === '') return c;
  if (c === '1') return shape;
  if (c === '-1') return `-${shape}`;
  return `${c}*${shape}`;
}

export function monomialKey(m: Monomial): string {
  return `${rationalToString(m.coefficient)}|${shapeKey(m)}`;
}

