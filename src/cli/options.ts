/**
 * The one table of command-line options (CLAIMS.md, command line). It drives
 * parsing, validation and `--help`; nothing else declares an option.
 */
export type CommandName = 'check' | 'expand' | 'type' | 'recheck';

export type OptionKind = 'flag' | 'integer' | 'string' | 'rational' | 'choice';

export interface OptionSpec {
  readonly name: string;
  readonly kind: OptionKind;
  readonly commands: readonly CommandName[];
  readonly help: string;
  /** Placeholder shown in help, e.g. `X`. */
  readonly value?: string;
  readonly choices?: readonly string[];
  readonly min?: number;
  readonly defaultText?: string;
}

const ALL: readonly CommandName[] = ['check', 'expand', 'type', 'recheck'];

export const OPTIONS: readonly OptionSpec[] = [
  { name: 'to', kind: 'rational', commands: ['expand'], value: 'X', help: 'expand up to q^X inclusive (a rational, e.g. 25/8)', defaultText: 'leading exponent + 5' },
  { name: 'format', kind: 'choice', commands: ['check', 'expand'], value: 'FMT', choices: ['text', 'json', 'junit'], help: 'output format: text or json (expand); text, json or junit (check; junit is JUnit XML)', defaultText: 'text' },
  { name: 'variables', kind: 'string', commands: ['expand', 'type'], value: 'z1,z2', help: 'the abelian variables of the expression', defaultText: 'z' },
  { name: 'max-terms', kind: 'integer', commands: ALL, value: 'N', min: 1, help: 'refuse any expansion needing more than N coefficients', defaultText: '10000000' },
  { name: 'output', kind: 'string', commands: ['check'], value: 'FILE', help: 'write the report to FILE instead of standard output' },
  { name: 'report', kind: 'string', commands: ['check'], value: 'FILE.html', help: 'also write a self-contained HTML report with coefficient grids' },
  { name: 'certificates', kind: 'string', commands: ['check'], value: 'DIR', help: 'write one JSON certificate per proved claim into DIR (created if missing; see sturmcheck recheck)' },
  { name: 'jobs', kind: 'integer', commands: ['check'], value: 'N', min: 1, help: 'check claim files in N worker threads; the report keeps file order', defaultText: 'number of cores' },
  { name: 'depth', kind: 'integer', commands: ['check'], value: 'N', min: 0, help: 'q-steps past the nominal bound compared for unproved claims', defaultText: '10' },
  { name: 'verbose', kind: 'flag', commands: ['check', 'type'], help: 'show types and the derivation of each bound' },
  { name: 'no-color', kind: 'flag', commands: ALL, help: 'no colour (also when NO_COLOR is set)' },
  { name: 'help', kind: 'flag', commands: ALL, help: 'show this help' },
  { name: 'version', kind: 'flag', commands: ALL, help: 'show the version' },
];

export const DEFAULT_MAX_TERMS = 10_000_000;
export const DEFAULT_DEPTH = 10;

export function optionSpec(name: string): OptionSpec | undefined {
  return OPTIONS.find((o) => o.name === name);
}
