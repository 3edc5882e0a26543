/**
 * The output formats of `check`, by the name `--format` takes. Adding a format is
 * one file and one entry here; the command line lists the names it accepts in its
 * option table and says "not available yet" for a name missing from this map.
 */
import type { Reporter } from './reporter.js';
import { terminalReporter } from './terminal-report.js';
import { jsonReporter } from './json-report.js';
import { junitReporter } from './junit-report.js';

export const REPORTERS: ReadonlyMap<string, Reporter> = new Map<string, Reporter>([
  ['text', terminalReporter],
  ['json', jsonReporter],
  ['junit', junitReporter],
]);
