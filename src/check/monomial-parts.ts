/**
 * A monomial split as MATH.md §4 needs it: units (η-powers, invertible as series),
 * a theta block that the divisor rule shows holomorphic (expanded by exact slice
 * division), the remaining numerator factors, and the denominator — every other
 * non-unit with a negative exponent, which makes the expression meromorphic.
 */
import {
  type ModularType,
  type FormClass,
  constantType,
  typeProduct,
  typePower,
  thetaQuotientHolomorphic,
  thetaQuotientHolomorphicMulti,
} from '../types/index.js';
import type { AtomPower, Monomial } from './atom.js';
import { sortedFactors } from './monomial.js';

export interface MonomialParts {
  readonly units: readonly AtomPower[];
  /** Theta factors with some negative exponent whose quotient is holomorphic; else empty. */
  readonly thetaBlock: readonly AtomPower[];
  /** Non-units with positive exponent outside the theta block. */
  readonly numerator: readonly AtomPower[];
  /** Non-units with negative exponent, stored with the positive exponent of the divisor. */
  readonly denominator: readonly AtomPower[];
}

/** The divisor rule of MATH.md §3: one variable directly, several by primitive direction. */
function thetaBlockIsHolomorphic(thetas: readonly AtomPower[]): boolean {
  const oneVariable = thetas.every((p) => p.atom.thetaL!.length === 1);
  return oneVariable
    ? thetaQuotientHolomorphic(thetas.map((p) => ({ a: p.atom.thetaL![0]!, exponent: p.exponent }))).holomorphic
    : thetaQuotientHolomorphicMulti(thetas.map((p) => ({ l: p.atom.thetaL!, exponent: p.exponent }))).holomorphic;
}

export function splitMonomial(m: Monomial): MonomialParts {
  const units: AtomPower[] = [];
  const thetas: AtomPower[] = [];
  const others: AtomPower[] = [];
  for (const p of sortedFactors(m)) {
    if (p.atom.kind === 'unit') units.push(p);
    else if (p.atom.kind === 'theta') thetas.push(p);
    else others.push(p);
  }
  const hasThetaDivisor = thetas.some((p) => p.exponent < 0);
  const block = hasThetaDivisor && thetaBlockIsHolomorphic(thetas);
  const rest = block ? others : [...thetas, ...others];
  return {
    units,
    thetaBlock: block ? thetas : [],
    numerator: rest.filter((p) => p.exponent > 0),
    denominator: rest.filter((p) => p.exponent < 0).map((p) => ({ atom: p.atom, exponent: -p.exponent })),
  };
}

/** Type by the product rule; null for the literal 0, which has every type. */
export function monomialType(m: Monomial, nvars: number): ModularType | null {
  if (m.coefficient.num.toString() === '0') return null;
  let t = constantType(nvars);
  for (const p of m.factors.values()) t = typeProduct(t, typePower(p.atom.type, p.exponent));
  return t;
}

/** quasi if any atom is; else meromorphic if a non-unit divisor remains; else modular. */
export function monomialClass(m: Monomial): FormClass {
  for (const p of m.factors.values()) if (p.atom.cls === 'quasi') return 'quasi';
  return splitMonomial(m).denominator.length > 0 ? 'meromorphic' : 'modular';
}

export function quasiReasons(m: Monomial): string[] {
  const out: string[] = [];
  for (const p of m.factors.values()) if (p.atom.quasiReason !== null) out.push(p.atom.quasiReason);
  return [...new Set(out)];
}
