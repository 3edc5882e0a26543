/**
 * The file name of each claim's certificate in `--certificates DIR` (the rule is
 * stated in the README and in grammar/certificate.schema.json):
 *
 *   <file>--<claim>.json
 *
 * <file> is the slug of the claim file's base name without its extension, <claim> the
 * slug of the claim's name (`line-N` for an unnamed claim, whose name is `file:line`).
 * A slug is the text in NFKD with combining marks dropped, lower-cased, each run of
 * characters other than a–z and 0–9 turned into one `-`, trimmed of `-`, cut to
 * SLUG_LENGTH characters; `file` or `claim` when nothing is left. When names collide,
 * the later claims in the order checked (files in order, claims in file order) get
 * `-2`, `-3`, … before `.json`. Every claim takes part, proved or not, so that one
 * claim's verdict changing never renames another claim's certificate.
 */
import { basename, extname } from 'node:path';

export const SLUG_LENGTH = 60;

export function slug(text: string, fallback: string): string {
  const s = text
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, SLUG_LENGTH)
    .replace(/-+$/, '');
  return s === '' ? fallback : s;
}

export interface NamedClaim {
  readonly file: string;
  readonly line: number;
  readonly name: string;
}

function baseName(c: NamedClaim): string {
  const stem = basename(c.file, extname(c.file));
  const claim = c.name === `${c.file}:${c.line}` ? `line-${c.line}` : slug(c.name, 'claim');
  return `${slug(stem, 'file')}--${claim}`;
}

/** One file name per claim, in the order given, unique within the run. */
export function certificateFileNames(claims: readonly NamedClaim[]): string[] {
  const taken = new Set<string>();
  return claims.map((c) => {
    const base = baseName(c);
    let name = `${base}.json`;
    for (let k = 2; taken.has(name); k++) name = `${base}-${k}.json`;
    taken.add(name);
    return name;
  });
}
