/** `sturmcheck expand EXPR [--to X] [--format text|json]` (CLAIMS.md). */
import type { Rational } from '../../series/index.js';
import { newEvalContext, evaluate, expandMonomial } from '../../check/index.js';
import { expansionText, expansionJson, jsonText } from '../../report/index.js';
import type { ParsedArgs } from '../parse-args.js';
import type { CliIo } from '../io.js';
import { DEFAULT_MAX_TERMS } from '../options.js';
import { expressionArgument, withEvalDiagnostics } from '../expression-argument.js';

export function runExpand(args: ParsedArgs, io: CliIo): number {
  const arg = expressionArgument('expand', args, io);
  if (!arg.ok) return arg.status;
  const to = (args.options.get('to') as Rational | undefined) ?? null;
  const maxTerms = (args.options.get('max-terms') as number | undefined) ?? DEFAULT_MAX_TERMS;
  return withEvalDiagnostics(io, arg.text, () => {
    const value = evaluate(arg.expr, newEvalContext(arg.text, arg.variables));
    const expansion = expandMonomial(value, arg.variables.length, to, maxTerms, arg.expr.span);
    const format = args.options.get('format') ?? 'text';
    io.stdout(format === 'json' ? jsonText(expansionJson(arg.text, expansion), 2) + '\n' : expansionText(arg.text, expansion));
  });
}
