/**
 * The statements a claim depends on, transitively (certificates): the `variables`
 * line, every `let` its relation uses and every `let` those use, the `assume`s about
 * any of them, and the lattices named anywhere in these. Returned as source text in
 * file order, so the closure followed by the claim is a claim file of its own that
 * defines everything before it is used — what `recheck` parses.
 */
import type { ClaimFile, Expr, Statement, TypeSpec } from '../lang/ast.js';

type ClaimStatement = Extract<Statement, { kind: 'claim' }>;

interface Uses {
  readonly lets: Set<string>;
  readonly lattices: Set<string>;
}

function exprUses(e: Expr, into: Uses): void {
  switch (e.kind) {
    case 'ref':
      into.lets.add(e.name);
      return;
    case 'latticeTheta':
      into.lattices.add(e.lattice);
      return;
    case 'neg':
      exprUses(e.operand, into);
      return;
    case 'binary':
    case 'bracket':
      exprUses(e.left, into);
      exprUses(e.right, into);
      return;
    case 'power':
      exprUses(e.base, into);
      return;
    case 'substitute':
      exprUses(e.target, into);
      return;
    case 'hecke':
    case 'derivative':
    case 'taylor':
      exprUses(e.arg, into);
      return;
    case 'number':
    case 'eta':
    case 'delta':
    case 'eisenstein':
    case 'jacobiEisenstein':
    case 'namedForm':
    case 'theta':
    case 'wp':
      return;
  }
}

function typeUses(t: TypeSpec, into: Uses): void {
  if (t.index.kind === 'latticeName') into.lattices.add(t.index.name);
}

function relationUses(s: ClaimStatement, into: Uses): void {
  const r = s.relation;
  if (r.kind === 'identity') {
    exprUses(r.left, into);
    exprUses(r.right, into);
  } else {
    exprUses(r.expr, into);
    typeUses(r.type, into);
  }
}

/** The statements of the closure, in file order. */
export function dependencyStatements(ast: ClaimFile, claim: ClaimStatement): Statement[] {
  const before = ast.statements.filter((s) => s.span.startOffset < claim.span.startOffset);
  const lets = new Map<string, Extract<Statement, { kind: 'let' }>>();
  for (const s of before) if (s.kind === 'let' && !lets.has(s.name)) lets.set(s.name, s);
  const uses: Uses = { lets: new Set(), lattices: new Set() };
  relationUses(claim, uses);
  // Walk definitions until no new name appears (a worklist over the let graph).
  const pending = [...uses.lets];
  while (pending.length > 0) {
    const def = lets.get(pending.pop()!);
    if (def === undefined) continue;
    const inner: Uses = { lets: new Set(), lattices: uses.lattices };
    exprUses(def.body, inner);
    for (const n of inner.lets) {
      if (!uses.lets.has(n)) {
        uses.lets.add(n);
        pending.push(n);
      }
    }
  }
  const kept = before.filter((s) => {
    switch (s.kind) {
      case 'variables':
        return true;
      case 'let':
        return uses.lets.has(s.name) && lets.get(s.name) === s;
      case 'assume':
        if (!uses.lets.has(s.name)) return false;
        typeUses(s.type, uses);
        return true;
      default:
        return false;
    }
  });
  const lattices = before.filter((s) => s.kind === 'lattice' && uses.lattices.has(s.name));
  return [...kept, ...lattices].sort((a, b) => a.span.startOffset - b.span.startOffset);
}

/** The closure as source text: one statement per line group, in file order. */
export function dependencyClosure(ast: ClaimFile, claim: ClaimStatement): string {
  return dependencyStatements(ast, claim)
    .map((s) => ast.text.slice(s.span.startOffset, s.span.endOffset))
    .join('\n');
}
