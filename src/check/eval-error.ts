/**
 * Evaluation failures the user can cause. Thrown inside the evaluator (its recursion
 * has no other exit) and caught at its public boundary, where they become
 * diagnostics; nothing escapes as a stack trace.
 */
import type { Diagnostic, DiagnosticTemplate } from '../lang/diagnostic.js';
import { diagnostic } from '../lang/diagnostic.js';
import type { Span } from '../lang/span.js';

export class EvalError extends Error {
  readonly diagnostic: Diagnostic;
  constructor(d: Diagnostic) {
    super(d.message);
    this.diagnostic = d;
  }
}

export function evalError(
  t: DiagnosticTemplate,
  args: Readonly<Record<string, string | number>>,
  span: Span | null,
  notes?: readonly string[],
): EvalError {
  return new EvalError(diagnostic(t, args, span, notes));
}
