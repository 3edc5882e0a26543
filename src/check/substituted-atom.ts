/**
 * The generic substitution of an atom's variables through its series: with the old
 * variables w = A·z (A has a row per old variable and a column per new one),
 * ζ_w^ℓ ↦ ζ_z^{Aᵀℓ} and the index becomes AᵀMA (MATH.md §3; one variable: z ↦ a·z,
 * index a²m). Used for atoms with no structural rule (E_{k,1}, named forms,
 * derivatives, restricted blocks). A zero column restricts, and the valuation is then
 * only a lower bound. Substitutions compose: (w = A·y, y = B·z) is w = (AB)·z.
 */
import { mapSource, substituteLinear, rat } from '../series/index.js';
import { typeSubstitute, matrixRank } from '../types/index.js';
import type { Atom, Monomial } from './atom.js';
import { atomMonomial } from './monomial.js';

export type IntMatrix = readonly (readonly number[])[];

/** Canonical names of the new variables: z for one, z1 … zn for several. */
export function variableName(j: number, n: number): string {
  return n === 1 ? 'z' : `z${j + 1}`;
}

/** Σ_j row[j]·z_j as text, e.g. `2z`, `z1 - z2`, `0`. */
export function linearFormText(row: readonly number[] | number, n = 1): string {
  const coeffs = typeof row === 'number' ? [row] : row;
  let out = '';
  coeffs.forEach((c, j) => {
    if (c === 0) return;
    const name = variableName(j, typeof row === 'number' ? 1 : n);
    const mag = Math.abs(c) === 1 ? name : `${Math.abs(c)}${name}`;
    out += out === '' ? (c < 0 ? `-${mag}` : mag) : c < 0 ? ` - ${mag}` : ` + ${mag}`;
  });
  return out === '' ? '0' : out;
}

export function substitutionText(A: IntMatrix): string {
  const n = A[0]?.length ?? 0;
  return A.map((row) => linearFormText(row, n)).join(', ');
}

export function isIdentity(A: IntMatrix): boolean {
  return A.length === (A[0]?.length ?? -1) && A.every((row, i) => row.every((x, j) => x === (i === j ? 1 : 0)));
}

export function composeSubstitutions(A: IntMatrix, B: IntMatrix): number[][] {
  return A.map((row) => B[0]!.map((_, j) => row.reduce((s, x, k) => s + x * B[k]![j]!, 0)));
}

function substitutedFrom(base: Atom, A: IntMatrix): Atom {
  const atom: Atom = {
    key: `${base.key}(${substitutionText(A)})`,
    kind: 'other',
    type: typeSubstitute(base.type, A),
    cls: base.cls,
    quasiReason: base.quasiReason,
    source: mapSource(base.source, (s) => substituteLinear(s, A)),
    // ℓ ↦ Aᵀℓ is injective exactly when A has full row rank: then a non-zero slice stays non-zero.
    valuationExact: base.valuationExact && matrixRank(A.map((row) => row.map((x) => rat(x)))) === A.length,
    thetaL: null,
    substitute: (B: IntMatrix): Monomial => atomMonomial(substitutedFrom(base, composeSubstitutions(A, B))),
  };
  return atom;
}

/** The atom after w = A·z; the identity substitution returns the atom itself. */
export function substitutedAtom(base: Atom, A: IntMatrix): Atom {
  return isIdentity(A) ? base : substitutedFrom(base, A);
}
