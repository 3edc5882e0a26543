/**
 * The certificate of a proved claim (`check --certificates DIR`), one JSON file per
 * claim. It stands alone: the claim and its whole dependency closure as source text,
 * so that `recheck` can re-derive every recorded step — normal form, types, bound,
 * coefficient count, digest — from it and nothing else. The format is documented in
 * grammar/certificate.schema.json (JSON Schema draft 2020-12); this is its TypeScript
 * face. Data only.
 */
import type { BoundParameters, FactorRecord, TypeRecord } from './verdict.js';

export const CERTIFICATE_FORMAT = 'sturmcheck-certificate';
/** Raised whenever a field changes meaning; `recheck` refuses versions it does not know. */
export const CERTIFICATE_FORMAT_VERSION = 1;
/** Names the canonical coefficient list the digest is taken of (the schema defines it). */
export const COEFFICIENT_LIST_NAME = 'sturmcheck-coefficients-v1';

export interface CertificateClaim {
  readonly name: string;
  readonly file: string;
  readonly line: number;
  /** `identity` (`L == R`) or `type` (`E is TYPE`). */
  readonly relation: 'identity' | 'type';
  /** The claim statement as written (CRLF → LF). */
  readonly text: string;
  /** SHA-256 of `text` as UTF-8, lower-case hex. */
  readonly sha256: string;
}

export interface CertificateClosure {
  /** Every statement the claim depends on, transitively, as source text in file order. */
  readonly text: string;
  readonly sha256: string;
}

export interface CertificateSide {
  /** The side of F as the checker prints it, e.g. `eta^-6*theta(z)^2`. */
  readonly text: string;
  readonly coefficient: string;
  readonly factors: readonly FactorRecord[];
}

/** F = left − right = 0, as compared (MATH.md §4). */
export interface CertificateNormalForm {
  readonly compared: 'sides' | 'cross-multiplied';
  readonly leftMultipliedBy?: string;
  readonly rightMultipliedBy?: string;
  readonly left: CertificateSide;
  readonly right: CertificateSide;
  /** F's type, from which the bound is taken. */
  readonly type: TypeRecord;
}

export interface CertificateBound extends BoundParameters {
  readonly theorem: 'A' | 'B';
  /** Every coefficient with q-exponent ≤ qOrder was compared. */
  readonly qOrder: string;
  readonly derivation: string;
  /** The q-order the margin check reached after the proof (MATH.md §6). */
  readonly marginTo: string;
}

/**
 * How the coefficients were computed: exact rational arithmetic, or residues modulo
 * the listed primes, whose product exceeds 2·2^heightBits, every numerator of both
 * sides over their common denominator being at most 2^heightBits (MATH.md §8).
 */
export type CertificateRoute =
  | { readonly route: 'exact' }
  | { readonly route: 'modular'; readonly primes: readonly number[]; readonly heightBits: number };

export interface CertificateComparison {
  /** Positions compared: q-exponent ≤ bound.qOrder, either side non-zero. */
  readonly coefficients: number;
  readonly digest: {
    readonly algorithm: 'sha256';
    readonly list: typeof COEFFICIENT_LIST_NAME;
    readonly value: string;
  };
}

export interface Certificate {
  readonly format: typeof CERTIFICATE_FORMAT;
  readonly formatVersion: typeof CERTIFICATE_FORMAT_VERSION;
  readonly tool: { readonly name: 'sturmcheck'; readonly version: string };
  readonly claim: CertificateClaim;
  readonly closure: CertificateClosure;
  readonly verdict: 'proved';
  readonly assumptions: readonly string[];
  /** The claim's type (of both sides, or of the asserted expression). */
  readonly type?: TypeRecord;
  /** Identities proved by comparing coefficients. */
  readonly normalForm?: CertificateNormalForm;
  readonly bound?: CertificateBound;
  readonly route: CertificateRoute;
  readonly comparison?: CertificateComparison;
  /** Why the claim holds when no coefficients were compared for a bound (type rules, literal zero, a holomorphy criterion). */
  readonly reason?: string;
}
