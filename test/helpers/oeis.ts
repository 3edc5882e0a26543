/**
 * Reads the OEIS data files of ../shared/reference/oeis (see INDEX.md there): the
 * terms of one sequence, with the offset of the first term.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';
import { JSBI, type Int } from '../../src/series/index.js';

const here = dirname(fileURLToPath(import.meta.url));
export const OEIS_DIR = resolve(here, '../../../shared/reference/oeis');

export interface OeisSequence {
  readonly id: string;
  readonly offset: number;
  readonly terms: readonly string[];
}

export function readOeis(id: string): OeisSequence {
  const text = readFileSync(resolve(OEIS_DIR, `${id}.txt`), 'utf8');
  let offset = 0;
  let terms: string[] = [];
  for (const line of text.split('\n')) {
    const m = /^# offset:\s*(-?\d+)/.exec(line);
    if (m) offset = Number(m[1]);
    else if (line.trim() !== '' && !line.startsWith('#')) terms = line.trim().split(',').map((t) => t.trim());
  }
  return { id, offset, terms };
}

/** The term a(n) as a decimal string. */
export function oeisTerm(seq: OeisSequence, n: number): string {
  const t = seq.terms[n - seq.offset];
  if (t === undefined) throw new RangeError(`${seq.id} has no term ${n}`);
  return t;
}

/** All terms of a sequence as JSBI integers (offset ignored: index i is the i-th listed term). */
export function oeisIntegers(id: string): Int[] {
  return readOeis(id).terms.map((t) => JSBI.BigInt(t));
}
