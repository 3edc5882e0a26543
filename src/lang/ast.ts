/**
 * The abstract syntax of claim files (CLAIMS.md). Every node carries its source span.
 * This is the contract between the front end (lexer, parser, CST → AST) and every
 * later layer: the parser resolves names, so an `Expr` is already classified
 * (built-in form, operator, substitution, reference to a `let`).
 */
import type { Span } from './span.js';

/** `Σ coeffs[v]·v` over the file's variables; integer coefficients, zero entries omitted. */
export interface LinearForm {
  readonly coeffs: Readonly<Record<string, number>>;
  readonly span: Span;
}

/** The named weak/cusp forms of MATH.md §2, spelled canonically. */
export type NamedFormName =
  | 'phi_{-2,1}'
  | 'phi_{0,1}'
  | 'phi_{-1,2}'
  | 'phi_{0,3/2}'
  | 'phi_{10,1}'
  | 'phi_{12,1}';

export type Expr =
  /** A non-negative integer literal of any size, as decimal digits. */
  | { readonly kind: 'number'; readonly value: string; readonly span: Span }
  | { readonly kind: 'neg'; readonly operand: Expr; readonly span: Span }
  | {
      readonly kind: 'binary';
      readonly op: '+' | '-' | '*' | '/';
      readonly left: Expr;
      readonly right: Expr;
      readonly span: Span;
    }
  /** `base ^ exponent`, the exponent a signed decimal integer. */
  | { readonly kind: 'power'; readonly base: Expr; readonly exponent: string; readonly span: Span }
  | { readonly kind: 'eta'; readonly span: Span }
  | { readonly kind: 'delta'; readonly span: Span }
  /** `E_k`, k even ≥ 2 (`E_2` is quasi-modular). */
  | { readonly kind: 'eisenstein'; readonly weight: number; readonly span: Span }
  /** `E_{k,1}`, k even ≥ 4. */
  | { readonly kind: 'jacobiEisenstein'; readonly weight: number; readonly span: Span }
  | { readonly kind: 'namedForm'; readonly name: NamedFormName; readonly span: Span }
  /** `theta(L)`: ϑ(τ, L(z)). */
  | { readonly kind: 'theta'; readonly arg: LinearForm; readonly span: Span }
  /** `wp(L)`: (2πi)^{-2} ℘(τ, L(z)). */
  | { readonly kind: 'wp'; readonly arg: LinearForm; readonly span: Span }
  /** `Theta[NAME](L1, …, Ln)`; `args` empty means the file's variables in order. */
  | {
      readonly kind: 'latticeTheta';
      readonly lattice: string;
      readonly args: readonly LinearForm[];
      readonly allZero: boolean;
      readonly span: Span;
    }
  /** A use of a `let` name (without arguments). */
  | { readonly kind: 'ref'; readonly name: string; readonly span: Span }
  /**
   * `HEAD(L1, …, Lk)` or `HEAD(0)` for a head that takes substitution: a `ref` or a
   * built-in form (`phi_{0,1}(2z)`, `E_{4,1}(0)`, `F(z, 2z)`). `allZero` marks `(0)`,
   * which sets every variable to 0 whatever the arity; then `args` is empty.
   */
  | {
      readonly kind: 'substitute';
      readonly target: Expr;
      readonly args: readonly LinearForm[];
      readonly allZero: boolean;
      readonly span: Span;
    }
  /** `V_l(f)`, `U_l(f)`, `T_p(f)`. */
  | {
      readonly kind: 'hecke';
      readonly op: 'V' | 'U' | 'T';
      readonly level: number;
      readonly arg: Expr;
      readonly span: Span;
    }
  | {
      readonly kind: 'derivative';
      readonly op: 'heat' | 'serre' | 'Dq' | 'Dz';
      readonly arg: Expr;
      readonly span: Span;
    }
  | { readonly kind: 'taylor'; readonly arg: Expr; readonly order: number; readonly span: Span }
  /** Rankin–Cohen bracket `[f, g]_n`. */
  | {
      readonly kind: 'bracket';
      readonly left: Expr;
      readonly right: Expr;
      readonly order: number;
      readonly span: Span;
    };

/** A matrix literal `[[a, b], [b, c]]`, entries as rational literals (`"1"`, `"-1/2"`). */
export interface MatrixLiteral {
  readonly rows: readonly (readonly string[])[];
  readonly span: Span;
}

export type IndexSpec =
  | { readonly kind: 'scalar'; readonly value: string; readonly span: Span }
  | { readonly kind: 'matrix'; readonly matrix: MatrixLiteral }
  /** `lattice [[…]]`: an even Gram matrix G, meaning M = G/2. */
  | { readonly kind: 'latticeMatrix'; readonly gram: MatrixLiteral }
  /** `lattice NAME`. */
  | { readonly kind: 'latticeName'; readonly name: string; readonly span: Span };

/** `jacobi(weight W, index I[, character eta^D]) [weak|holomorphic|cusp]`. */
export interface TypeSpec {
  /** A rational literal, e.g. `"-2"`, `"1/2"`. */
  readonly weight: string;
  readonly index: IndexSpec;
  /** D of `eta^D` (any integer as written; reduce mod 24 later); null when absent. */
  readonly character: number | null;
  readonly qualifier: 'weak' | 'holomorphic' | 'cusp' | null;
  readonly span: Span;
}

export type Relation =
  | { readonly kind: 'identity'; readonly left: Expr; readonly right: Expr; readonly span: Span }
  | { readonly kind: 'typeAssertion'; readonly expr: Expr; readonly type: TypeSpec; readonly span: Span };

export type Expectation = 'proved' | 'refuted' | 'unproved';

export type Statement =
  | { readonly kind: 'variables'; readonly names: readonly string[]; readonly span: Span }
  | { readonly kind: 'lattice'; readonly name: string; readonly gram: MatrixLiteral; readonly span: Span }
  | {
      readonly kind: 'let';
      readonly name: string;
      /** null for a parameterless `let` (it takes the file's variables in declared order). */
      readonly params: readonly string[] | null;
      readonly body: Expr;
      readonly span: Span;
    }
  | { readonly kind: 'assume'; readonly name: string; readonly type: TypeSpec; readonly span: Span }
  | {
      readonly kind: 'claim';
      /** The written name (JSON escapes decoded), or null: the name then defaults to `file:line`. */
      readonly name: string | null;
      readonly expect: Expectation | null;
      readonly relation: Relation;
      readonly span: Span;
    };

export interface ClaimFile {
  readonly file: string;
  /** The source after BOM stripping and CRLF → LF; diagnostics quote lines from it. */
  readonly text: string;
  /** The file's variables (default `['z']`). */
  readonly variables: readonly string[];
  /** Well-formed statements only; a statement with a syntax error is dropped and diagnosed. */
  readonly statements: readonly Statement[];
}
