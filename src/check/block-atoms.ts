/**
 * Atoms for the building blocks of MATH.md §2, each with its type, class, series
 * source and substitution rule. ϑ(τ, −a z) = −ϑ(τ, a z) (MATH.md §2), so theta atoms
 * are normalised to a ≥ 1 with the sign in the coefficient; ϑ(τ, 0) = 0 identically.
 * Δ is η²⁴, so that Δ and η-powers cancel structurally.
 */
import { rat, type Rational } from '../series/index.js';
import type { NamedFormName } from '../lang/ast.js';
import {
  thetaSource,
  etaPowerSource,
  eisensteinSource,
  jacobiEisensteinSource,
} from '../forms/leaves.js';
import { phiMinus2Source } from '../forms/phi-m2-1.js';
import { phi0Source } from '../forms/phi-0-1.js';
import { phiMinus1Index2Source } from '../forms/phi-m1-2.js';
import { phi0Index3HalfSource } from '../forms/phi-0-3half.js';
import { phi10Source } from '../forms/phi-10-1.js';
import { phi12Source } from '../forms/phi-12-1.js';
import { wpNumeratorSource } from '../forms/wp.js';
import {
  thetaType,
  etaType,
  eisensteinType,
  jacobiEisensteinType,
  namedFormType,
  namedFormValuation,
  wpNumeratorType,
} from '../types/index.js';
import type { Atom, Monomial } from './atom.js';
import { atomMonomial, ZERO_MONOMIAL, powerMonomial, multiplyMonomials } from './monomial.js';
import { substitutedAtom, linearFormText } from './substituted-atom.js';
import type { SeriesSource } from '../series/index.js';

function withSeriesSubstitution(base: Omit<Atom, 'substitute'>): Atom {
  const atom: Atom = {
    ...base,
    substitute: (a: number): Monomial => (a === 1 ? atomMonomial(atom) : atomMonomial(substitutedAtom(atom, a))),
  };
  return atom;
}

/** Atoms of index 0 are unchanged by z ↦ a·z. */
function indexZero(base: Omit<Atom, 'substitute'>): Atom {
  const atom: Atom = { ...base, substitute: (): Monomial => atomMonomial(atom) };
  return atom;
}

export const ETA_ATOM: Atom = indexZero({
  key: 'eta',
  kind: 'unit',
  type: etaType(1),
  cls: 'modular',
  quasiReason: null,
  source: etaPowerSource(1),
  valuationExact: true,
  thetaA: null,
});

export function deltaMonomial(): Monomial {
  return atomMonomial(ETA_ATOM, 24);
}

function thetaAtom(a: number): Atom {
  const atom: Atom = {
    key: `theta(${linearFormText(a)})`,
    kind: 'theta',
    type: thetaType([a]),
    cls: 'modular',
    quasiReason: null,
    source: thetaSource(a),
    valuationExact: true,
    thetaA: a,
    substitute: (b: number): Monomial => thetaMonomial(a * b),
  };
  return atom;
}

/** ϑ(τ, a z) as a monomial: 0 for a = 0, −ϑ(τ, |a| z) for a < 0. */
export function thetaMonomial(a: number): Monomial {
  if (a === 0) return ZERO_MONOMIAL;
  return atomMonomial(thetaAtom(Math.abs(a)), 1, rat(a > 0 ? 1 : -1));
}

export function eisensteinAtom(k: number): Atom {
  return indexZero({
    key: `E_${k < 10 ? k : `{${k}}`}`,
    kind: 'other',
    type: eisensteinType(k, 1),
    cls: k === 2 ? 'quasi' : 'modular',
    quasiReason: k === 2 ? 'E_2 is quasi-modular (MATH.md §5)' : null,
    source: eisensteinSource(k),
    valuationExact: true,
    thetaA: null,
  });
}

export function jacobiEisensteinAtom(k: number): Atom {
  return withSeriesSubstitution({
    key: `E_{${k},1}`,
    kind: 'other',
    type: jacobiEisensteinType(k),
    cls: 'modular',
    quasiReason: null,
    source: jacobiEisensteinSource(k),
    valuationExact: true,
    thetaA: null,
  });
}

const NAMED_SOURCES: Readonly<Record<NamedFormName, () => SeriesSource>> = {
  'phi_{-2,1}': phiMinus2Source,
  'phi_{0,1}': phi0Source,
  'phi_{-1,2}': phiMinus1Index2Source,
  'phi_{0,3/2}': phi0Index3HalfSource,
  'phi_{10,1}': phi10Source,
  'phi_{12,1}': phi12Source,
};

export function namedFormAtom(name: NamedFormName): Atom {
  const src = NAMED_SOURCES[name]();
  const v: Rational = namedFormValuation(name);
  return withSeriesSubstitution({
    key: name,
    kind: 'other',
    type: namedFormType(name),
    cls: 'modular',
    quasiReason: null,
    source: { valuation: v, expand: (X) => src.expand(X) },
    valuationExact: true,
    thetaA: null,
  });
}

/** N = ℘̃·ϑ², an atom of class modular (MATH.md §2, ℘̃ row). */
const WP_NUMERATOR: Atom = withSeriesSubstitution({
  key: 'wpnum(z)',
  kind: 'other',
  type: wpNumeratorType([1]),
  cls: 'modular',
  quasiReason: null,
  source: wpNumeratorSource(),
  valuationExact: true,
  thetaA: null,
});

/** ℘̃(τ, a z) = N(τ, a z)/ϑ(τ, a z)² (MATH.md §2); wp(0) has a pole everywhere: 0/0. */
export function wpMonomial(a: number): Monomial | null {
  if (a === 0) return null;
  const n = Math.abs(a);
  return multiplyMonomials(WP_NUMERATOR.substitute(n), powerMonomial(thetaMonomial(n), -2));
}
