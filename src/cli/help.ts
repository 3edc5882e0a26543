/** `--help`, generated from the option table. */
import { OPTIONS, type CommandName } from './options.js';

const USAGE = [
  'sturmcheck — proves or refutes identities between Jacobi forms',
  '',
  'usage:',
  '  sturmcheck [check] PATH…           check claim files (folders are searched for *.claim)',
  '  sturmcheck expand EXPR [--to X]    coefficient table of an expression up to q^X',
  '  sturmcheck type EXPR               inferred type, class and bound',
  '  sturmcheck recheck CERT.json       re-derive a certificate from scratch',
  '  (an EXPR starting with - follows --)',
];

export function helpText(command: CommandName | null): string {
  const lines = [...USAGE, '', command === null ? 'options:' : `options of '${command}':`];
  for (const o of OPTIONS) {
    if (command !== null && !o.commands.includes(command)) continue;
    const head = `  --${o.name}${o.value ? ` ${o.value}` : ''}`;
    const tail = `${o.help}${o.defaultText ? ` (default: ${o.defaultText})` : ''}${command === null ? ` [${o.commands.join(', ')}]` : ''}`;
    lines.push(`${head.padEnd(26)}${tail}`);
  }
  return lines.join('\n') + '\n';
}
