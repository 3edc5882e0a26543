/** Settings of a check run (CLAIMS.md options) and test-only hooks. */
import type { ModularType } from '../types/index.js';

export interface CheckOptions {
  /** Refuse any expansion needing more coefficients (`--max-terms`). */
  readonly maxTerms: number;
  /** q-steps past the nominal bound compared for unproved claims (`--depth`). */
  readonly depth: number;
  /** q-steps past the bound compared after a proof (MATH.md §6: at least two). */
  readonly margin: number;
  /**
   * Record what certificates and the HTML report need: the digest and a grid of the
   * compared coefficients, the bound's parameters, the claim's dependency closure.
   * Off by default, since hashing every coefficient costs time a plain check skips.
   */
  readonly evidence?: boolean;
  /**
   * How coefficients are computed: exact rationals, residues modulo word-size primes
   * under a proven height bound (MATH.md §8; one variable), or `auto` (the default),
   * which takes the modular route for one-variable claims whose bound needs at least
   * MODULAR_MIN_TERMS coefficients.
   */
  readonly arithmetic?: 'auto' | 'exact' | 'modular';
  /**
   * Test-only: replaces the inferred type of F before the bound is taken, to show
   * that a wrong type rule is caught by the margin check. Never set by the CLI.
   */
  readonly adjustTypeForTest?: (t: ModularType) => ModularType;
}

export const DEFAULT_CHECK_OPTIONS: CheckOptions = { maxTerms: 10_000_000, depth: 10, margin: 2 };
