/**
 * Types of the building blocks (MATH.md §2 table; named forms are atoms whose type is
 * the one stated there, each confirmed by tests). Index and multiplier follow the
 * product rule: any product of thetas over a power of eta has weight
 * (#thetas − #etas)/2, index Σ aᵢ²/2 and D = 3·#thetas − #etas (MATH.md §3).
 */
import { type Rational, rat } from '../series/index.js';
import { type ModularType, scalarIndex, zeroIndex } from './modular-type.js';
import type { NamedFormName } from '../lang/ast.js';

/** ϑ(τ, ℓ·z): weight ½, index ℓᵀℓ/2, v_η³ (times the Heisenberg character of ℓ). */
export function thetaType(l: readonly number[]): ModularType {
  const index = l.map((x) => l.map((y) => rat(x * y, 2)));
  return { weight: rat(1, 2), index, etaPower: 3 };
}

export function etaType(n: number): ModularType {
  return { weight: rat(1, 2), index: zeroIndex(n), etaPower: 1 };
}

/** E_k: weight k, index 0, trivial multiplier (E_2 only quasi-modular). */
export function eisensteinType(k: number, n: number): ModularType {
  return { weight: rat(k), index: zeroIndex(n), etaPower: 0 };
}

/** E_{k,1}: weight k, index 1 (one variable). */
export function jacobiEisensteinType(k: number): ModularType {
  return { weight: rat(k), index: scalarIndex(rat(1)), etaPower: 0 };
}

interface NamedFormInfo {
  readonly weight: Rational;
  readonly index: Rational;
  readonly etaPower: number;
  /** Lowest q-exponent (exact: the q⁰/q¹ slices of MATH.md §2 are non-zero). */
  readonly valuation: Rational;
}

const NAMED: Readonly<Record<NamedFormName, NamedFormInfo>> = {
  'phi_{-2,1}': { weight: rat(-2), index: rat(1), etaPower: 0, valuation: rat(0) },
  'phi_{0,1}': { weight: rat(0), index: rat(1), etaPower: 0, valuation: rat(0) },
  'phi_{-1,2}': { weight: rat(-1), index: rat(2), etaPower: 0, valuation: rat(0) },
  'phi_{0,3/2}': { weight: rat(0), index: rat(3, 2), etaPower: 0, valuation: rat(0) },
  'phi_{10,1}': { weight: rat(10), index: rat(1), etaPower: 0, valuation: rat(1) },
  'phi_{12,1}': { weight: rat(12), index: rat(1), etaPower: 0, valuation: rat(1) },
};

export function namedFormType(name: NamedFormName): ModularType {
  const f = NAMED[name];
  return { weight: f.weight, index: scalarIndex(f.index), etaPower: f.etaPower };
}

export function namedFormValuation(name: NamedFormName): Rational {
  return NAMED[name].valuation;
}

/**
 * N = ℘̃(τ, a z)·ϑ(τ, a z)²: weight 3, index a², multiplier v_η⁶ (MATH.md §2, ℘̃ row:
 * ℘̃ has weight 2, index 0; ϑ(az)² has weight 1, index a², v_η⁶).
 */
export function wpNumeratorType(l: readonly number[]): ModularType {
  const index = l.map((x) => l.map((y) => rat(x * y)));
  return { weight: rat(3), index, etaPower: 6 };
}


