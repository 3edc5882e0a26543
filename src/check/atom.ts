/**
 * The symbolic form of an evaluated expression (MATH.md §4): a rational coefficient
 * times a product of *atoms* with integer exponents. Atoms are the units (η), the
 * theta leaves ϑ(τ, a z), and everything else that cannot be split further (E_k,
 * E_{k,1}, named forms, sums, derivatives). Keeping expressions in this form makes
 * cancellation structural: factors cancel only when their canonical keys agree,
 * never because they agree to some order.
 */
import type { Rational, SeriesSource } from '../series/index.js';
import type { ModularType } from '../types/index.js';

export type AtomKind = 'unit' | 'theta' | 'other';

export interface Atom {
  /** Canonical text; two atoms with the same key are the same function. */
  readonly key: string;
  readonly kind: AtomKind;
  /** The type by the rules of MATH.md §3 (nominal when the class is quasi). */
  readonly type: ModularType;
  readonly cls: 'modular' | 'quasi';
  /** Why the atom is quasi-modular, for reports. */
  readonly quasiReason: string | null;
  readonly source: SeriesSource;
  /** Whether source.valuation is exact (a non-zero lowest slice), not just a bound. */
  readonly valuationExact: boolean;
  /** ℓ of ϑ(τ, ℓ·z) for theta atoms (first non-zero entry positive); null otherwise. */
  readonly thetaL: readonly number[] | null;
  /**
   * The atom after the substitution w = A·z of its variables (A: a row per current
   * variable, a column per new one; one variable: [[a]] is z ↦ a·z, [[0]] restricts).
   */
  substitute(A: readonly (readonly number[])[]): Monomial;
}

export interface AtomPower {
  readonly atom: Atom;
  readonly exponent: number;
}

export interface Monomial {
  readonly coefficient: Rational;
  /** Keyed by atom key; exponents are non-zero. */
  readonly factors: ReadonlyMap<string, AtomPower>;
}
