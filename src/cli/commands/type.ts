/** `sturmcheck type EXPR [--variables z1,z2] [--verbose]` (CLAIMS.md): 0 done, 1 expression error, 2 usage. */
import { newEvalContext, describeType } from '../../check/index.js';
import { typeDescriptionText } from '../../report/index.js';
import type { ParsedArgs } from '../parse-args.js';
import type { CliIo } from '../io.js';
import { expressionArgument, withEvalDiagnostics } from '../expression-argument.js';

export function runType(args: ParsedArgs, io: CliIo): number {
  const arg = expressionArgument('type', args, io);
  if (!arg.ok) return arg.status;
  return withEvalDiagnostics(io, arg.text, () => {
    const description = describeType(arg.expr, newEvalContext(arg.text, arg.variables));
    io.stdout(typeDescriptionText(arg.text, description, args.options.get('verbose') === true));
  });
}
