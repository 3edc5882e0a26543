/**
 * Whether a stream gets ANSI colour: only a terminal, and neither `--no-color` nor a
 * non-empty `NO_COLOR` (no-color.org) may be set.
 */
import type { ParsedArgs } from './parse-args.js';
import type { CliIo } from './io.js';

export function wantsColor(args: ParsedArgs, io: CliIo, isTerminal: boolean): boolean {
  const noColorEnv = io.env['NO_COLOR'];
  return isTerminal && args.options.get('no-color') !== true && (noColorEnv === undefined || noColorEnv === '');
}
