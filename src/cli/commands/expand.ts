/** `sturmcheck expand EXPR [--to X] [--format text|json]` (CLAIMS.md). */
import type { Rational } from '../../series/index.js';
import { parseExpression, formatDiagnostic, type Diagnostic } from '../../lang/index.js';
import { newEvalContext, evaluate, expandMonomial, EvalError } from '../../check/index.js';
import { expansionText, expansionJson, jsonText } from '../../report/index.js';
import type { ParsedArgs } from '../parse-args.js';
import { type CliIo, EXIT_FAILED, EXIT_OK, EXIT_USAGE } from '../io.js';
import { DEFAULT_MAX_TERMS } from '../options.js';

export function variablesOption(args: ParsedArgs): string[] {
  const raw = args.options.get('variables');
  return typeof raw === 'string' ? raw.split(',').map((v) => v.trim()).filter((v) => v !== '') : ['z'];
}

function printDiagnostics(io: CliIo, ds: readonly Diagnostic[], text: string): void {
  for (const d of ds) io.stderr(formatDiagnostic(d, text) + '\n');
}

export function runExpand(args: ParsedArgs, io: CliIo): number {
  if (args.positionals.length !== 1) {
    io.stderr('expand takes exactly one expression (quote it; an expression starting with - follows --)\n');
    return EXIT_USAGE;
  }
  const text = args.positionals[0]!;
  const variables = variablesOption(args);
  const parsed = parseExpression(text, variables);
  if (parsed.expr === null || parsed.diagnostics.some((d) => d.severity === 'error')) {
    printDiagnostics(io, parsed.diagnostics, text);
    return EXIT_FAILED;
  }
  const to = (args.options.get('to') as Rational | undefined) ?? null;
  const maxTerms = (args.options.get('max-terms') as number | undefined) ?? DEFAULT_MAX_TERMS;
  try {
    const ctx = newEvalContext(text, variables);
    const value = evaluate(parsed.expr, ctx);
    const expansion = expandMonomial(value, variables.length, to, maxTerms, parsed.expr.span);
    const format = args.options.get('format') ?? 'text';
    io.stdout(format === 'json' ? jsonText(expansionJson(text, expansion), 2) + '\n' : expansionText(text, expansion));
    return EXIT_OK;
  } catch (e) {
    if (e instanceof EvalError) {
      printDiagnostics(io, [e.diagnostic], text);
      return EXIT_FAILED;
    }
    throw e;
  }
}
