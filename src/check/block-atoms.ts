/**
 * Atoms for the building blocks of MATH.md §2 in a file with n variables, each with
 * its type, class, series source and substitution rule. ϑ(τ, −ℓ·z) = −ϑ(τ, ℓ·z)
 * (MATH.md §2), so theta atoms are normalised to a first non-zero entry > 0 with the
 * sign in the coefficient; ϑ(τ, 0) = 0 identically. Δ is η²⁴, so that Δ and η-powers
 * cancel structurally. Forms of index 0 are lifted to n variables unchanged; the named
 * forms live in one variable and enter an n-variable file only through a substitution.
 */
import { rat, type Rational, type SeriesSource, mapSource, substituteLinear } from '../series/index.js';
import type { NamedFormName } from '../lang/ast.js';
import { thetaSource, etaPowerSource, eisensteinSource, jacobiEisensteinSource } from '../forms/leaves.js';
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
import { substitutedAtom, linearFormText, type IntMatrix } from './substituted-atom.js';

/** A one-variable source seen in n variables through w = ℓ·z (ℓ = 0: lifted unchanged). */
function viaRow(s: SeriesSource, row: readonly number[]): SeriesSource {
  return row.length === 1 && row[0] === 1 ? s : mapSource(s, (x) => substituteLinear(x, [row]));
}

function zeros(n: number): number[] {
  return new Array<number>(n).fill(0);
}

/** Index-0 atoms are unchanged by substitutions other than the change of variable count. */
function indexZeroAtom(base: Omit<Atom, 'substitute' | 'source'>, oneVariable: SeriesSource, n: number): Atom {
  const atom: Atom = {
    ...base,
    source: viaRow(oneVariable, n === 1 ? [1] : zeros(n)),
    substitute: (A: IntMatrix): Monomial => {
      const m = A[0]!.length;
      return atomMonomial(m === n ? atom : indexZeroAtom({ ...base, type: { ...base.type, index: zeroIndexOf(m) } }, oneVariable, m));
    },
  };
  return atom;
}

function zeroIndexOf(n: number): Rational[][] {
  return Array.from({ length: n }, () => zeros(n).map(() => rat(0)));
}

export function etaAtom(n: number): Atom {
  return indexZeroAtom(
    { key: 'eta', kind: 'unit', type: etaType(n), cls: 'modular', quasiReason: null, valuationExact: true, thetaL: null },
    etaPowerSource(1),
    n,
  );
}

export function deltaMonomial(n: number): Monomial {
  return atomMonomial(etaAtom(n), 24);
}

export function eisensteinAtom(k: number, n: number): Atom {
  return indexZeroAtom(
    {
      key: `E_${k < 10 ? k : `{${k}}`}`,
      kind: 'other',
      type: eisensteinType(k, n),
      cls: k === 2 ? 'quasi' : 'modular',
      quasiReason: k === 2 ? 'E_2 is quasi-modular' : null,
      valuationExact: true,
      thetaL: null,
    },
    eisensteinSource(k),
    n,
  );
}

/** Sign normalisation: the first non-zero entry positive. */
function normalised(l: readonly number[]): { l: number[]; sign: number } {
  const first = l.find((x) => x !== 0) ?? 0;
  return first < 0 ? { l: l.map((x) => -x), sign: -1 } : { l: [...l], sign: 1 };
}

function thetaAtom(l: readonly number[]): Atom {
  const atom: Atom = {
    key: `theta(${linearFormText(l, l.length)})`,
    kind: 'theta',
    type: thetaType(l),
    cls: 'modular',
    quasiReason: null,
    source: l.length === 1 ? thetaSource(l[0]!) : viaRow(thetaSource(1), l),
    valuationExact: true,
    thetaL: l,
    // ℓ·(A z) = (Aᵀℓ)·z
    substitute: (A: IntMatrix): Monomial => thetaMonomial(A[0]!.map((_, j) => l.reduce((s, x, i) => s + x * A[i]![j]!, 0))),
  };
  return atom;
}

/** ϑ(τ, ℓ·z) as a monomial: 0 for ℓ = 0, −ϑ(τ, −ℓ·z) when the first entry is negative. */
export function thetaMonomial(l: readonly number[]): Monomial {
  if (l.every((x) => x === 0)) return ZERO_MONOMIAL;
  const { l: p, sign } = normalised(l);
  return atomMonomial(thetaAtom(p), 1, rat(sign));
}

/** A one-variable atom whose substitution goes through its series. */
function oneVariableAtom(base: Omit<Atom, 'substitute'>): Atom {
  const atom: Atom = { ...base, substitute: (A: IntMatrix): Monomial => atomMonomial(substitutedAtom(atom, A)) };
  return atom;
}

export function jacobiEisensteinAtom(k: number): Atom {
  return oneVariableAtom({
    key: `E_{${k},1}`,
    kind: 'other',
    type: jacobiEisensteinType(k),
    cls: 'modular',
    quasiReason: null,
    source: jacobiEisensteinSource(k),
    valuationExact: true,
    thetaL: null,
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
  return oneVariableAtom({
    key: name,
    kind: 'other',
    type: namedFormType(name),
    cls: 'modular',
    quasiReason: null,
    source: { valuation: namedFormValuation(name), expand: (X) => src.expand(X) },
    valuationExact: true,
    thetaL: null,
  });
}

/** N = ℘̃·ϑ², an atom of class modular (MATH.md §2, ℘̃ row). */
const WP_NUMERATOR: Atom = oneVariableAtom({
  key: 'wpnum(z)',
  kind: 'other',
  type: wpNumeratorType([1]),
  cls: 'modular',
  quasiReason: null,
  source: wpNumeratorSource(),
  valuationExact: true,
  thetaL: null,
});

/** ℘̃(τ, ℓ·z) = N(τ, ℓ·z)/ϑ(τ, ℓ·z)² (MATH.md §2); ℓ = 0 is a pole everywhere: null. */
export function wpMonomial(l: readonly number[]): Monomial | null {
  if (l.every((x) => x === 0)) return null;
  const { l: p } = normalised(l);
  return multiplyMonomials(WP_NUMERATOR.substitute([p]), powerMonomial(thetaMonomial(p), -2));
}

