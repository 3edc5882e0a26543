/**
 * The verdict record of one claim (CLAIMS.md, verdicts and `--format json`). Data
 * only: the checker fills it, reporters render it, certificates (a later issue)
 * extend it with the digest of the compared coefficients.
 */
import type { Diagnostic } from '../lang/diagnostic.js';

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
}

export interface MismatchRecord {
  readonly q: string;
  /** One entry per variable. */
  readonly zeta: readonly string[];
  readonly left: string;
  readonly right: string;
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
  readonly reason?: string;
  readonly seconds: number;
  readonly normalForm?: NormalFormRecord;
  /** The diagnostics behind an `error` verdict. */
  readonly diagnostics?: readonly Diagnostic[];
  /** The source text of the claim, for reports. */
  readonly claimText?: string;
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
