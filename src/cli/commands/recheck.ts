/**
 * `sturmcheck recheck CERT.json` (CLAIMS.md): 0 confirmed, 1 a step disagrees (the
 * step and both values are named), 2 an unusable file (unreadable, not UTF-8, not
 * JSON, not the shape of a certificate) or a usage error. The re-derivation itself
 * is check/recheck.ts; this file only reads the file and words the answer.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { DEFAULT_CHECK_OPTIONS, recheckText, type RecheckResult } from '../../check/index.js';
import type { ParsedArgs } from '../parse-args.js';
import { type CliIo, EXIT_FAILED, EXIT_OK, EXIT_USAGE } from '../io.js';
import { DEFAULT_MAX_TERMS } from '../options.js';
import { toolVersion } from '../version.js';

function readText(path: string): string | { problem: string } {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch (e) {
    const code = typeof e === 'object' && e !== null && 'code' in e ? String(e.code) : '';
    return { problem: `cannot read it${code === '' ? '' : ` (${code})`}` };
  }
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return { problem: 'it is not UTF-8 text' };
  }
}

function confirmedText(r: Extract<RecheckResult, { status: 'confirmed' }>): string {
  const c = r.certificate;
  const lines = [`confirmed  ${c.claim.name}  (${c.claim.file}:${c.claim.line})`];
  if (c.bound !== undefined && c.comparison !== undefined) {
    lines.push(`    bound     ${c.bound.derivation}`);
    lines.push(`    compared  ${c.comparison.coefficients} coefficients up to q-order ${c.bound.qOrder}, digest ${c.comparison.digest.value.slice(0, 16)}… equal`);
  } else if (c.reason !== undefined) lines.push(`    ${c.reason}`);
  if (c.assumptions.length > 0) lines.push(`    assuming  ${c.assumptions.join(', ')}`);
  lines.push('    every step re-derived from the claim and its closure agrees with the certificate');
  return `${lines.join('\n')}\n`;
}

export function runRecheck(args: ParsedArgs, io: CliIo): number {
  if (args.positionals.length !== 1) {
    io.stderr('sturmcheck: recheck takes exactly one certificate file\n(see sturmcheck recheck --help)\n');
    return EXIT_USAGE;
  }
  const given = args.positionals[0]!;
  const text = readText(resolve(io.cwd, given));
  if (typeof text !== 'string') {
    io.stderr(`sturmcheck: ${given} is unusable: ${text.problem}\n`);
    return EXIT_USAGE;
  }
  const maxTerms = args.options.get('max-terms');
  const opts = { ...DEFAULT_CHECK_OPTIONS, maxTerms: typeof maxTerms === 'number' ? maxTerms : DEFAULT_MAX_TERMS };
  const r = recheckText(text, opts, toolVersion());
  switch (r.status) {
    case 'unusable':
      io.stderr(`sturmcheck: ${given} is unusable: ${r.problem}\n`);
      return EXIT_USAGE;
    case 'disagrees':
      io.stdout(`rejected   ${r.certificate.claim.name}  (${r.certificate.claim.file}:${r.certificate.claim.line})\n    step '${r.step}' disagrees: ${r.detail}\n`);
      return EXIT_FAILED;
    case 'confirmed':
      io.stdout(confirmedText(r));
      return EXIT_OK;
  }
}
