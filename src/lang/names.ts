/**
 * Names as the lexer sees them (`φ_{0, 1}`, `E_10`) and as the rest of the program
 * sees them (`phi_{0,1}`): Unicode letters spelled out, subscripts normalised so that
 * `E_4` and `E_{4}` are one name.
 */

/** Unicode spellings accepted for built-in names (CLAIMS.md, "Unicode"). */
export const GREEK_SPELLINGS: Readonly<Record<string, string>> = {
  '\u03d1': 'theta', // ϑ
  '\u03b8': 'theta', // θ
  '\u03b7': 'eta', // η
  '\u03c4': 'tau', // τ
  '\u0394': 'Delta', // Δ
  '\u2206': 'Delta', // ∆ (increment sign, often typed for Δ)
  '\u03c6': 'phi', // φ
  '\u03d5': 'phi', // ϕ
  '\u2118': 'wp', // ℘
};

/** The characters above as a regular-expression class body. */
export const GREEK_CLASS = Object.keys(GREEK_SPELLINGS).join('');

export interface NameParts {
  /** The letters and digits before `_`, Unicode spelled out. */
  readonly base: string;
  /** The normalised subscript (no braces, no spaces, ASCII minus), or null. */
  readonly subscript: string | null;
}

/** Why a name token is malformed; each maps to a lexical diagnostic. */
export type NameProblem =
  | { readonly kind: 'unbracedLong'; readonly suggestion: string }
  | { readonly kind: 'unclosedBrace' }
  | { readonly kind: 'emptySubscript' }
  | { readonly kind: 'badSubscriptCharacter'; readonly character: string };

export interface NameReading {
  readonly parts: NameParts;
  readonly canonical: string;
  /** Null when the name is well formed; the parts are a best-effort reading either way. */
  readonly problem: NameProblem | null;
}

const SUBSCRIPT_CHARACTERS = /^[A-Za-z0-9,/+-]*$/;

export function spellOutGreek(text: string): string {
  let out = '';
  for (const ch of text) out += GREEK_SPELLINGS[ch] ?? ch;
  return out;
}

/** Spaces stripped and U+2212 → `-`, so that `{-2, 1}` and `{−2,1}` agree. */
export function normaliseSubscript(raw: string): string {
  return raw.replace(/\s+/g, '').replace(/\u2212/g, '-');
}

/** One-character subscripts stay bare (`E_4`), longer ones get braces (`E_{10}`), as in TeX. */
export function canonicalName(parts: NameParts): string {
  if (parts.subscript === null) return parts.base;
  return parts.subscript.length === 1 ? `${parts.base}_${parts.subscript}` : `${parts.base}_{${parts.subscript}}`;
}

/** Reads a subscript as written after `_` (`4`, `10`, `{4,1}`, `{4,1` when unclosed). */
export function readSubscript(written: string): { subscript: string; problem: NameProblem | null } {
  if (written.startsWith('{')) {
    const closed = written.endsWith('}');
    const subscript = normaliseSubscript(written.slice(1, closed ? -1 : undefined));
    if (!closed) return { subscript, problem: { kind: 'unclosedBrace' } };
    if (subscript.length === 0) return { subscript, problem: { kind: 'emptySubscript' } };
    if (!SUBSCRIPT_CHARACTERS.test(subscript)) {
      const character = [...subscript].find((c) => !SUBSCRIPT_CHARACTERS.test(c)) ?? '?';
      return { subscript, problem: { kind: 'badSubscriptCharacter', character } };
    }
    return { subscript, problem: null };
  }
  if (written.length > 1) return { subscript: written, problem: { kind: 'unbracedLong', suggestion: '' } };
  return { subscript: written, problem: null };
}

/** Splits a NAME token image into base and subscript and checks the subscript. */
export function readName(image: string): NameReading {
  const underscore = image.indexOf('_');
  const base = spellOutGreek(underscore < 0 ? image : image.slice(0, underscore));
  if (underscore < 0) return { parts: { base, subscript: null }, canonical: base, problem: null };
  const { subscript, problem } = readSubscript(image.slice(underscore + 1));
  const parts = { base, subscript };
  const canonical = canonicalName(parts);
  if (problem?.kind === 'unbracedLong') {
    return { parts, canonical, problem: { kind: 'unbracedLong', suggestion: canonical } };
  }
  return { parts, canonical, problem };
}
