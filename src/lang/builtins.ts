/**
 * The built-in names of expressions (CLAIMS.md, "Expressions") and what each one is:
 * a form, a function of a linear form, an operator, or a misspelling of a family
 * member that deserves its own message (`E_3`, `V_0`).
 */
import type { NamedFormName } from './ast.js';
import type { DiagnosticTemplate } from './diagnostic.js';
import { codes } from './diagnostic-codes.js';
import type { NameParts } from './names.js';

/** A built-in form usable bare: its AST node, without the span. */
export type BuiltinForm =
  | { readonly kind: 'eta' }
  | { readonly kind: 'delta' }
  | { readonly kind: 'eisenstein'; readonly weight: number }
  | { readonly kind: 'jacobiEisenstein'; readonly weight: number }
  | { readonly kind: 'namedForm'; readonly name: NamedFormName };

export type Builtin =
  | { readonly kind: 'form'; readonly form: BuiltinForm }
  | { readonly kind: 'ofLinearForm'; readonly op: 'theta' | 'wp' }
  | { readonly kind: 'derivative'; readonly op: 'heat' | 'serre' | 'Dq' | 'Dz' }
  | { readonly kind: 'hecke'; readonly op: 'V' | 'U' | 'T'; readonly level: number }
  | { readonly kind: 'taylor' }
  | { readonly kind: 'invalid'; readonly template: DiagnosticTemplate; readonly args: Readonly<Record<string, string>> };

export const NAMED_FORMS: readonly NamedFormName[] = [
  'phi_{-2,1}',
  'phi_{0,1}',
  'phi_{-1,2}',
  'phi_{0,3/2}',
  'phi_{10,1}',
  'phi_{12,1}',
];

const DERIVATIVES = ['heat', 'serre', 'Dq', 'Dz'] as const;
const HECKE = ['V', 'U', 'T'] as const;

/** Canonical spellings, for suggestions; families are represented by their first members. */
export function builtinNames(): readonly string[] {
  return [
    'theta',
    'wp',
    'eta',
    'Delta',
    'E_2',
    'E_4',
    'E_6',
    'E_8',
    'E_{10}',
    'E_{12}',
    'E_{4,1}',
    'E_{6,1}',
    'E_{8,1}',
    'E_{10,1}',
    ...NAMED_FORMS,
    'Theta',
    'V_2',
    'U_2',
    'T_2',
    'heat',
    'serre',
    'Dq',
    'Dz',
    'taylor',
  ];
}

/** What a name means as a built-in, or null if it is not one (a let, a variable, unknown). */
export function lookupBuiltin(parts: NameParts, canonical: string): Builtin | null {
  const { base, subscript } = parts;
  if (subscript === null) return bareBuiltin(base);
  if (base === 'E') return eisensteinFamily(subscript, canonical);
  if (base === 'phi') {
    const named = NAMED_FORMS.find((n) => n === canonical);
    return named ? { kind: 'form', form: { kind: 'namedForm', name: named } } : null;
  }
  const hecke = HECKE.find((op) => op === base);
  if (hecke && /^[0-9]+$/.test(subscript)) {
    const level = Number(subscript);
    if (level > 0 && Number.isSafeInteger(level)) return { kind: 'hecke', op: hecke, level };
    return { kind: 'invalid', template: codes.badOperatorLevel, args: { name: canonical, example: `${base}_2(f)` } };
  }
  return null;
}

function bareBuiltin(base: string): Builtin | null {
  switch (base) {
    case 'eta':
      return { kind: 'form', form: { kind: 'eta' } };
    case 'Delta':
      return { kind: 'form', form: { kind: 'delta' } };
    case 'E4':
      return { kind: 'form', form: { kind: 'eisenstein', weight: 4 } };
    case 'E6':
      return { kind: 'form', form: { kind: 'eisenstein', weight: 6 } };
    case 'theta':
    case 'wp':
      return { kind: 'ofLinearForm', op: base };
    case 'taylor':
      return { kind: 'taylor' };
    default: {
      const derivative = DERIVATIVES.find((d) => d === base);
      return derivative ? { kind: 'derivative', op: derivative } : null;
    }
  }
}

/** `E_k` (k even ≥ 2) and `E_{k,1}` (k even ≥ 4); other `E_{k,m}` get a clear refusal. */
function eisensteinFamily(subscript: string, canonical: string): Builtin | null {
  const single = /^[0-9]+$/.exec(subscript);
  if (single) {
    const k = Number(subscript);
    if (k >= 2 && k % 2 === 0 && Number.isSafeInteger(k)) return { kind: 'form', form: { kind: 'eisenstein', weight: k } };
    return { kind: 'invalid', template: codes.badEisensteinWeight, args: { name: canonical } };
  }
  const pair = /^([0-9]+),([0-9]+)$/.exec(subscript);
  if (pair) {
    const k = Number(pair[1]);
    if (pair[2] === '1' && k >= 4 && k % 2 === 0 && Number.isSafeInteger(k)) {
      return { kind: 'form', form: { kind: 'jacobiEisenstein', weight: k } };
    }
    return { kind: 'invalid', template: codes.badJacobiEisenstein, args: { name: canonical } };
  }
  return null;
}

/** Names a `let`, a parameter or a variable may not take. */
export function isReservedName(parts: NameParts, canonical: string): boolean {
  return lookupBuiltin(parts, canonical) !== null || NAMED_FORMS.some((n) => n === canonical);
}
