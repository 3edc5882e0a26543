/**
 * `sturmcheck type EXPR` as text: what the checker infers about an expression and
 * what an identity with it as F would have to compare. `verbose` adds the
 * normalised expression the inference worked on.
 */
import { rationalToString } from '../series/index.js';
import { formatType } from '../types/index.js';
import type { TypeDescription } from '../check/index.js';
import { monomialText } from '../check/monomial.js';

function typeLine(d: TypeDescription): string {
  if (d.type === null) return 'every type (the expression is the constant 0)';
  const formal = d.cls === 'quasi' ? '  (formal, by the rules; not a proven modular type)' : '';
  const parity = d.consistent ? '' : '  (inconsistent: 2k and the η-power differ in parity)';
  return `${formatType(d.type)}${formal}${parity}`;
}

function classLine(d: TypeDescription): string {
  return d.quasiReasons.length === 0 ? d.cls : `${d.cls}: ${d.quasiReasons.join('; ')}`;
}

/** The Heisenberg character is never written in a claim: it follows from the index (MATH.md §3). */
function heisenbergLine(d: TypeDescription): string {
  if (d.heisenberg.every((c) => c === 0)) return 'trivial';
  return `non-trivial, c = (${d.heisenberg.join(', ')}) (sign (-1)^λ under z → z + λτ)`;
}

function boundLines(d: TypeDescription): [string, string][] {
  if (d.bound === null) return [['bound', d.type === null ? 'none needed' : 'none']];
  const of =
    d.cls === 'quasi'
      ? ' (nominal: a quasi-modular claim is compared past it and is at best unproved)'
      : d.denominators.length > 0
        ? ' (of the numerator after clearing the divisors)'
        : '';
  return [
    ['bound', `q-order ${rationalToString(d.bound)}${of}`],
    ['derivation', d.derivation ?? ''],
  ];
}

export function typeDescriptionText(expression: string, d: TypeDescription, verbose: boolean): string {
  const rows: [string, string][] = [['expression', expression]];
  if (verbose) rows.push(['normalised', monomialText(d.value)]);
  rows.push(
    ['type', typeLine(d)],
    ['class', classLine(d)],
    ['divisors', d.denominators.length === 0 ? 'none' : d.denominators.join(', ')],
    ['theta block', d.thetaBlock === null ? 'none' : `${d.thetaBlock}: holomorphic by the divisor rule`],
  );
  if (d.type !== null) rows.push(['heisenberg', heisenbergLine(d)]);
  d.operators.forEach((step, i) => rows.push([i === 0 ? 'operators' : '', `${step.text}: ${step.input} → ${step.output}`]));
  rows.push(...boundLines(d));
  return rows.map(([k, v]) => `${k.padEnd(13)}${v}`).join('\n') + '\n';
}
