/** `sturmcheck type EXPR [--variables z1,z2] [--verbose]` (CLAIMS.md): 0 done, 1 expression error, 2 usage. */
import { parseExpression, formatDiagnostic, type Diagnostic } from '../../lang/index.js';
import { newEvalContext, describeType, EvalError } from '../../check/index.js';
import { typeDescriptionText } from '../../report/index.js';
import type { ParsedArgs } from '../parse-args.js';
import { type CliIo, EXIT_FAILED, EXIT_OK, EXIT_USAGE } from '../io.js';
import { variablesOption } from './expand.js';

function printDiagnostics(io: CliIo, ds: readonly Diagnostic[], text: string): void {
  for (const d of ds) io.stderr(formatDiagnostic(d, text) + '\n');
}

export function runType(args: ParsedArgs, io: CliIo): number {
  if (args.positionals.length !== 1) {
    io.stderr('type takes exactly one expression (quote it; an expression starting with - follows --)\n');
    return EXIT_USAGE;
  }
  const text = args.positionals[0]!;
  const variables = variablesOption(args);
  const parsed = parseExpression(text, variables);
  if (parsed.expr === null || parsed.diagnostics.some((d) => d.severity === 'error')) {
    printDiagnostics(io, parsed.diagnostics, text);
    return EXIT_FAILED;
  }
  try {
    const description = describeType(parsed.expr, newEvalContext(text, variables));
    io.stdout(typeDescriptionText(text, description, args.options.get('verbose') === true));
    return EXIT_OK;
  } catch (e) {
    if (e instanceof EvalError) {
      printDiagnostics(io, [e.diagnostic], text);
      return EXIT_FAILED;
    }
    throw e;
  }
}
