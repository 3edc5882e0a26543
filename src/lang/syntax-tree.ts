/**
 * The tree between the CST and the AST: expressions are still generic (a call is
 * `callee(args)`, a name is just a name). `resolve-expr.ts` classifies it into the
 * `Expr` kinds of ast.ts; types and matrices are already in their AST form.
 */
import type { Expectation, MatrixLiteral, TypeSpec } from './ast.js';
import type { NameParts } from './names.js';
import type { Span } from './span.js';

export interface NameRef {
  /** Canonical spelling (`phi_{0,1}`, `E_4`). */
  readonly name: string;
  readonly parts: NameParts;
  /** As written, for messages (`φ_{0, 1}`). */
  readonly written: string;
  readonly span: Span;
}

export type SyntaxExpr =
  | { readonly kind: 'number'; readonly value: string; readonly span: Span }
  | { readonly kind: 'name'; readonly ref: NameRef; readonly span: Span }
  | { readonly kind: 'tau'; readonly span: Span }
  /** `2z`: an integer directly followed by a name (or `tau`). */
  | {
      readonly kind: 'scaled';
      readonly coefficient: string;
      readonly term: NameRef | null;
      readonly span: Span;
    }
  | {
      readonly kind: 'call';
      readonly callee: SyntaxExpr;
      readonly args: readonly SyntaxExpr[];
      readonly span: Span;
    }
  | { readonly kind: 'paren'; readonly inner: SyntaxExpr; readonly span: Span }
  | { readonly kind: 'neg'; readonly operand: SyntaxExpr; readonly span: Span }
  | {
      readonly kind: 'binary';
      readonly op: '+' | '-' | '*' | '/';
      readonly left: SyntaxExpr;
      readonly right: SyntaxExpr;
      readonly span: Span;
    }
  | { readonly kind: 'power'; readonly base: SyntaxExpr; readonly exponent: string; readonly span: Span }
  | { readonly kind: 'latticeTheta'; readonly lattice: NameRef; readonly span: Span }
  | {
      readonly kind: 'bracket';
      readonly left: SyntaxExpr;
      readonly right: SyntaxExpr;
      /** The normalised subscript after `]_`. */
      readonly order: string;
      readonly orderSpan: Span;
      readonly span: Span;
    };

export type SyntaxRelation =
  | { readonly kind: 'identity'; readonly left: SyntaxExpr; readonly right: SyntaxExpr; readonly span: Span }
  | { readonly kind: 'typeAssertion'; readonly expr: SyntaxExpr; readonly type: TypeSpec; readonly span: Span };

export type SyntaxStatement =
  | { readonly kind: 'variables'; readonly names: readonly NameRef[]; readonly span: Span }
  | { readonly kind: 'lattice'; readonly name: NameRef; readonly gram: MatrixLiteral; readonly span: Span }
  | {
      readonly kind: 'let';
      readonly name: NameRef;
      readonly params: readonly NameRef[] | null;
      readonly body: SyntaxExpr;
      readonly span: Span;
    }
  | { readonly kind: 'assume'; readonly name: NameRef; readonly type: TypeSpec; readonly span: Span }
  | {
      readonly kind: 'claim';
      readonly name: string | null;
      readonly expect: Expectation | null;
      readonly relation: SyntaxRelation;
      readonly span: Span;
    };
