/**
 * argv → command, positionals and validated options, driven by the option table.
 * `--name value` and `--name=value` are accepted; `--` ends the options (an
 * expression starting with `-` follows it, CLAIMS.md).
 */
import { parseRational, type Rational } from '../series/index.js';
import { type CommandName, OPTIONS, optionSpec } from './options.js';

export type OptionValue = boolean | number | string | Rational;

export interface ParsedArgs {
  readonly command: CommandName;
  readonly positionals: readonly string[];
  readonly options: ReadonlyMap<string, OptionValue>;
}

export type ArgsResult = { ok: true; args: ParsedArgs } | { ok: false; message: string };

const COMMANDS: readonly CommandName[] = ['check', 'expand', 'type', 'recheck'];

type Converted = { ok: true; value: OptionValue } | { ok: false; message: string };

function convert(name: string, raw: string): Converted {
  const spec = optionSpec(name)!;
  switch (spec.kind) {
    case 'flag':
      return { ok: true, value: true };
    case 'integer': {
      const n = Number(raw);
      if (!/^\d+$/.test(raw) || !Number.isSafeInteger(n)) return { ok: false, message: `--${name} takes a whole number, not '${raw}'` };
      if (spec.min !== undefined && n < spec.min) return { ok: false, message: `--${name} must be at least ${spec.min}` };
      return { ok: true, value: n };
    }
    case 'rational': {
      const r = parseRational(raw);
      return r === undefined ? { ok: false, message: `--${name} takes a rational number such as 3 or 25/8, not '${raw}'` } : { ok: true, value: r };
    }
    case 'choice':
      return spec.choices!.includes(raw)
        ? { ok: true, value: raw }
        : { ok: false, message: `--${name} is one of ${spec.choices!.join(', ')}, not '${raw}'` };
    case 'string':
      return { ok: true, value: raw };
  }
}

export function parseArgs(argv: readonly string[]): ArgsResult {
  let rest = [...argv];
  let command: CommandName = 'check';
  if (rest.length > 0 && (COMMANDS as readonly string[]).includes(rest[0]!)) command = rest.shift() as CommandName;
  const positionals: string[] = [];
  const options = new Map<string, OptionValue>();
  while (rest.length > 0) {
    const arg = rest.shift()!;
    if (arg === '--') {
      positionals.push(...rest);
      rest = [];
      break;
    }
    if (!arg.startsWith('--') || arg === '-') {
      positionals.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const name = eq < 0 ? arg.slice(2) : arg.slice(2, eq);
    const spec = optionSpec(name);
    if (spec === undefined) return { ok: false, message: `unknown option --${name}${suggestOption(name)}` };
    if (!spec.commands.includes(command)) return { ok: false, message: `--${name} does not apply to '${command}'` };
    let raw = 'true';
    if (spec.kind !== 'flag') {
      if (eq >= 0) raw = arg.slice(eq + 1);
      else if (rest.length > 0) raw = rest.shift()!;
      else return { ok: false, message: `--${name} needs a value (${spec.value ?? 'VALUE'})` };
    } else if (eq >= 0) {
      return { ok: false, message: `--${name} takes no value` };
    }
    const v = convert(name, raw);
    if (!v.ok) return v;
    options.set(name, v.value);
  }
  if (command === 'expand' && options.get('format') === 'junit') {
    return { ok: false, message: '--format junit applies to check only' };
  }
  return { ok: true, args: { command, positionals, options } };
}

function suggestOption(name: string): string {
  const close = OPTIONS.map((o) => o.name).find((n) => n.startsWith(name.slice(0, 3)));
  return close === undefined ? '' : ` (did you mean --${close}?)`;
}
