/**
 * Dispatch of a command line. Returns the exit status; never throws: an unexpected
 * fault becomes "internal error" with a request for a report (ARCHITECTURE.md).
 */
import { parseArgs } from './parse-args.js';
import { helpText } from './help.js';
import { toolVersion } from './version.js';
import { type CliIo, EXIT_FAILED, EXIT_USAGE } from './io.js';
import { runExpand } from './commands/expand.js';
import { runCheck } from './commands/check.js';
import { runType } from './commands/type.js';
import { runRecheck } from './commands/recheck.js';

export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  const parsed = parseArgs(argv);
  if (!parsed.ok) {
    io.stderr(`sturmcheck: ${parsed.message}\n(see sturmcheck --help)\n`);
    return EXIT_USAGE;
  }
  const { args } = parsed;
  if (args.options.get('help') === true) {
    io.stdout(helpText(argv.length > 0 && argv[0] === args.command ? args.command : null));
    return 0;
  }
  if (args.options.get('version') === true) {
    io.stdout(`sturmcheck ${toolVersion()}\n`);
    return 0;
  }
  try {
    switch (args.command) {
      case 'expand':
        return runExpand(args, io);
      case 'check':
        return await runCheck(args, io);
      case 'type':
        return runType(args, io);
      case 'recheck':
        return runRecheck(args, io);
      default:
        io.stderr(`sturmcheck: '${args.command}' is not available in this version yet\n`);
        return EXIT_USAGE;
    }
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    io.stderr(`sturmcheck: internal error: ${detail}\nPlease report it with the command line and the claim text.\n`);
    return EXIT_FAILED;
  }
}
