/**
 * One claim file → one verdict per claim, in file order (CLAIMS.md). Syntax errors
 * and failed definitions become file-level `error` entries; one claim's failure,
 * even an internal fault, never stops the others.
 */
import type { ClaimFile, Statement, TypeSpec } from '../lang/ast.js';
import type { Diagnostic } from '../lang/diagnostic.js';
import { diagnostic } from '../lang/diagnostic.js';
import type { Span } from '../lang/span.js';
import type { Verdict, Expectation } from '../verdict/index.js';
import { newEvalContext, evaluateLetBody, type EvalContext } from './evaluate.js';
import { EvalError } from './eval-error.js';
import { assumedMonomial } from './assumed-atom.js';
import { typeFromSpec } from './type-spec.js';
import { checkIdentity } from './check-identity.js';
import { checkAssertion } from './check-assertion.js';
import type { CheckOptions } from './check-options.js';
import type { Outcome } from './outcome.js';
import { evalCodes } from './diagnostic-codes.js';
import { latticeProblem } from './lattice-check.js';
import { dependencyClosure } from './dependency-closure.js';

type ClaimStatement = Extract<Statement, { kind: 'claim' }>;
type LetStatement = Extract<Statement, { kind: 'let' }>;

export interface CheckListener {
  /** Called before each claim is checked (for a spinner). */
  readonly claimStarted?: (name: string) => void;
}

function now(): number {
  return performance.now();
}

function fileLevelError(file: string, d: Diagnostic): Verdict {
  const line = d.span?.startLine ?? 1;
  return {
    file,
    line,
    name: `${file}:${line}`,
    verdict: 'error',
    expected: 'proved',
    assumptions: [],
    reason: d.message,
    seconds: 0,
    diagnostics: [d],
  };
}

function sourceText(text: string, span: Span): string {
  return text.slice(span.startOffset, span.endOffset);
}

function defineLet(s: LetStatement, ctx: EvalContext, assumes: Map<string, { type: TypeSpec; span: Span }>): void {
  const used = new Set<string>();
  const letCtx: EvalContext = { ...ctx, usedAssumptions: used };
  let value = evaluateLetBody(s, letCtx);
  const assumption = assumes.get(s.name);
  if (assumption !== undefined) {
    const vars = ctx.letVariables.get(s.name) ?? ctx.variables;
    value = assumedMonomial(s.name, value, typeFromSpec(assumption.type, vars.length, ctx.lattices), vars.length, assumption.span);
    used.add(s.name);
  }
  ctx.lets.set(s.name, value);
  ctx.letAssumptions.set(s.name, used);
}

function checkOne(s: ClaimStatement, ctx: EvalContext, opts: CheckOptions): Outcome {
  return s.relation.kind === 'identity'
    ? checkIdentity(s.relation.left, s.relation.right, ctx, opts)
    : checkAssertion(s.relation.expr, s.relation.type, ctx, opts);
}

function failure(e: unknown): Outcome {
  if (e instanceof EvalError) return { verdict: 'error', reason: e.diagnostic.message, diagnostics: [e.diagnostic] };
  const detail = e instanceof Error ? e.message : String(e);
  return { verdict: 'error', reason: `internal error: ${detail}; please report it with the claim text` };
}

export function checkClaimFile(
  ast: ClaimFile,
  parseDiagnostics: readonly Diagnostic[],
  opts: CheckOptions,
  listener: CheckListener = {},
): Verdict[] {
  const verdicts: Verdict[] = parseDiagnostics.filter((d) => d.severity === 'error').map((d) => fileLevelError(ast.file, d));
  const ctx = newEvalContext(ast.text, ast.variables, opts.depth);
  const assumes = new Map<string, { type: TypeSpec; span: Span }>();
  for (const s of ast.statements) if (s.kind === 'assume') assumes.set(s.name, { type: s.type, span: s.span });
  const names = new Map<string, number>();
  for (const s of ast.statements) {
    if (s.kind === 'lattice') {
      const problem = latticeProblem(s.gram.rows);
      if (problem === null) ctx.lattices.set(s.name, s.gram.rows.map((row) => row.map(Number)));
      else verdicts.push(fileLevelError(ast.file, diagnostic(evalCodes.badLattice, { name: s.name, reason: problem }, s.span)));
      continue;
    }
    if (s.kind === 'let') {
      try {
        defineLet(s, ctx, assumes);
      } catch (e) {
        const f = failure(e);
        ctx.failedLets.set(s.name, f.reason ?? 'failed');
        const d = f.diagnostics?.[0] ?? diagnostic(evalCodes.internal, { detail: f.reason ?? '' }, s.span);
        verdicts.push({ ...fileLevelError(ast.file, d.span === null ? { ...d, span: s.span } : d), reason: `in the definition of ${s.name}: ${f.reason}` });
      }
      continue;
    }
    if (s.kind !== 'claim') continue;
    verdicts.push(checkClaim(s, ast, ctx, opts, names, listener));
  }
  return verdicts.sort((a, b) => a.line - b.line);
}

function checkClaim(
  s: ClaimStatement,
  ast: ClaimFile,
  ctx: EvalContext,
  opts: CheckOptions,
  names: Map<string, number>,
  listener: CheckListener,
): Verdict {
  const line = s.span.startLine;
  const name = s.name ?? `${ast.file}:${line}`;
  const expected: Expectation = s.expect ?? 'proved';
  const base = {
    file: ast.file,
    line,
    name,
    expected,
    claimText: sourceText(ast.text, s.span),
    relation: s.relation.kind === 'identity' ? ('identity' as const) : ('type' as const),
    ...(opts.evidence === true ? { closure: dependencyClosure(ast, s) } : {}),
  };
  const earlier = names.get(name);
  if (earlier !== undefined) {
    const d = diagnostic(evalCodes.duplicateClaim, { name, line: earlier }, s.span);
    return { ...base, verdict: 'error', assumptions: [], reason: d.message, seconds: 0, diagnostics: [d] };
  }
  names.set(name, line);
  listener.claimStarted?.(name);
  const claimCtx: EvalContext = { ...ctx, usedAssumptions: new Set() };
  const t0 = now();
  let outcome: Outcome;
  try {
    outcome = checkOne(s, claimCtx, opts);
  } catch (e) {
    outcome = failure(e);
  }
  const seconds = (now() - t0) / 1000;
  return { ...base, ...outcome, assumptions: [...claimCtx.usedAssumptions].sort(), seconds };
}
