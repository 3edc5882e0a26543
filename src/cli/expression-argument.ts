/**
 * The EXPR argument of `expand` and `type`: exactly one expression, parsed in the
 * variables of `--variables`; any diagnostic is printed with its caret line and the
 * command ends with status 1 (CLAIMS.md), a missing or extra argument with 2.
 */
import { parseExpression, formatDiagnostic, type Diagnostic, type Expr } from '../lang/index.js';
import { EvalError } from '../check/index.js';
import type { ParsedArgs } from './parse-args.js';
import { type CliIo, EXIT_FAILED, EXIT_OK, EXIT_USAGE } from './io.js';

export function variablesOption(args: ParsedArgs): string[] {
  const raw = args.options.get('variables');
  return typeof raw === 'string' ? raw.split(',').map((v) => v.trim()).filter((v) => v !== '') : ['z'];
}

export function printDiagnostics(io: CliIo, ds: readonly Diagnostic[], text: string): void {
  for (const d of ds) io.stderr(formatDiagnostic(d, text) + '\n');
}

export type ExpressionArgument =
  | { readonly ok: true; readonly text: string; readonly expr: Expr; readonly variables: string[] }
  | { readonly ok: false; readonly status: number };

export function expressionArgument(command: string, args: ParsedArgs, io: CliIo): ExpressionArgument {
  if (args.positionals.length !== 1) {
    io.stderr(`${command} takes exactly one expression (quote it; an expression starting with - follows --)\n`);
    return { ok: false, status: EXIT_USAGE };
  }
  const text = args.positionals[0]!;
  const variables = variablesOption(args);
  const parsed = parseExpression(text, variables);
  if (parsed.expr === null || parsed.diagnostics.some((d) => d.severity === 'error')) {
    printDiagnostics(io, parsed.diagnostics, text);
    return { ok: false, status: EXIT_FAILED };
  }
  return { ok: true, text, expr: parsed.expr, variables };
}

/** Runs a command body; an evaluation error is printed against the expression, status 1. */
export function withEvalDiagnostics(io: CliIo, text: string, body: () => void): number {
  try {
    body();
    return EXIT_OK;
  } catch (e) {
    if (e instanceof EvalError) {
      printDiagnostics(io, [e.diagnostic], text);
      return EXIT_FAILED;
    }
    throw e;
  }
}
