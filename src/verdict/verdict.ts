/**
 * The verdict record of one claim (CLAIMS.md, verdicts and `--format json`). Data
 * only: the checker fills it, reporters render it, and certificates are built from it
 * (the digest of the compared coefficients and the claim's closure travel in
 * `evidence` and `closure`, filled only when a run asks for them).
 */
import type { Diagnostic } from '../lang/diagnostic.js';
import type { CoefficientGrid } from './coefficient-grid.js';

export type VerdictKind = 'proved' | 'refuted' | 'unproved' | 'error';
export type Expectation = 'proved' | 'refuted' | 'unproved';

/** A type as CLAIMS.md prints it: rationals as strings, matrices as arrays. */
export interface TypeRecord {
  readonly weight?: string;
  readonly index?: string | string[][];
  readonly multiplier?: string;
  readonly class: 'modular' | 'meromorphic' | 'quasi';
}

export interface BoundRecord {
  /** "A" (MATH.md §6); later "B" for several variables. */
  readonly theorem: 'A' | 'B';
  /** The q-order compared to (inclusive), as a rational string. */
  readonly qOrder: string;
  readonly coefficientsChecked: number;
  /** Human-readable derivation, e.g. "(K + 2m)/12 = (12 + 2·1)/12 = 7/6". */
  readonly derivation: string;
  /** The q-order the margin check reached (MATH.md §6). */
  readonly marginTo?: string;
  /** The numbers the theorem was applied to; filled when evidence is recorded. */
  readonly parameters?: BoundParameters;
}

/** The primes of a modular comparison and the height bound 2^heightBits their product exceeds twice. */
export interface ModularRouteRecord {
  readonly primes: readonly number[];
  readonly heightBits: number;
}

/** K, m (or M), and for Theorem B the rank of M and ρ (MATH.md §6). */
export interface BoundParameters {
  /** K: the weight of F. */
  readonly weight: string;
  /** m for one variable (as used: max(m, 0)), the matrix M for several. */
  readonly index: string | string[][];
  /** rank M after splitting off its kernel (several variables only). */
  readonly rank?: number;
  /** ρ of the reduced index (several variables only; an upper bound is sound). */
  readonly rho?: string;
}

export interface MismatchRecord {
  readonly q: string;
  /** One entry per variable. */
  readonly zeta: readonly string[];
  readonly left: string;
  readonly right: string;
}

/** One factor `atom^exponent` of a side of F, with the type the rules give the atom. */
export interface FactorRecord {
  readonly atom: string;
  readonly exponent: number;
  readonly type: TypeRecord;
}

/** The normalised function F = 0 that was checked (MATH.md §4), for reports and certificates. */
export interface NormalFormRecord {
  readonly compared: 'sides' | 'cross-multiplied';
  /** Factors the left side was multiplied by (cross-multiplication), as text. */
  readonly leftMultipliedBy?: string;
  readonly rightMultipliedBy?: string;
  /** Text of the two expanded sides of F. */
  readonly left: string;
  readonly right: string;
  readonly type: TypeRecord;
  /** The rational coefficient and the factors of each side of F (certificates). */
  readonly leftCoefficient?: string;
  readonly leftFactors?: readonly FactorRecord[];
  readonly rightCoefficient?: string;
  readonly rightFactors?: readonly FactorRecord[];
}

/**
 * What the comparison of the two sides of F saw, recorded when a run asks for it
 * (certificates, the HTML report): the canonical digest of every compared coefficient
 * (grammar/certificate.schema.json defines the list) and a small grid to show.
 */
export interface ComparisonEvidence {
  /** The q-order compared to (inclusive): the bound, or the nominal bound plus depth. */
  readonly upTo: string;
  /** Positions where either side is non-zero, q-exponent ≤ upTo. */
  readonly coefficients: number;
  /** SHA-256 (lower-case hex) of the canonical list of those positions and values. */
  readonly sha256: string;
  readonly grid: CoefficientGrid;
}

export interface Verdict {
  readonly file: string;
  readonly line: number;
  readonly name: string;
  readonly verdict: VerdictKind;
  readonly expected: Expectation;
  readonly type?: TypeRecord;
  readonly leftType?: TypeRecord;
  readonly rightType?: TypeRecord;
  readonly compared?: 'sides' | 'cross-multiplied';
  readonly assumptions: readonly string[];
  readonly bound?: BoundRecord;
  readonly mismatch?: MismatchRecord;
  /** Present when the coefficients were compared modulo primes (MATH.md §8). */
  readonly route?: ModularRouteRecord;
  readonly reason?: string;
  readonly seconds: number;
  readonly normalForm?: NormalFormRecord;
  /** The diagnostics behind an `error` verdict. */
  readonly diagnostics?: readonly Diagnostic[];
  /** The source text of the claim, for reports. */
  readonly claimText?: string;
  /** Which relation the claim states (claims only; absent for file-level errors). */
  readonly relation?: 'identity' | 'type';
  /** The expansions compared, when evidence is recorded. */
  readonly evidence?: ComparisonEvidence;
  /**
   * The source text of every statement the claim depends on (variables, lattices,
   * definitions, assumptions), in file order, when evidence is recorded.
   */
  readonly closure?: string;
}

/** Whether a verdict is what its claim expected (CLAIMS.md, exit status of check). */
export function asExpected(v: Verdict): boolean {
  return v.verdict !== 'error' && v.verdict === v.expected;
}

export interface Summary {
  readonly proved: number;
  readonly refuted: number;
  readonly unproved: number;
  readonly error: number;
  readonly asExpected: boolean;
}

export function summarize(vs: readonly Verdict[]): Summary {
  const count = (k: VerdictKind): number => vs.filter((v) => v.verdict === k).length;
  return {
    proved: count('proved'),
    refuted: count('refuted'),
    unproved: count('unproved'),
    error: count('error'),
    asExpected: vs.every(asExpected),
  };
}
