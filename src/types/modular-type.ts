/**
 * Modular types (MATH.md §3): weight k ∈ ½Z, index a symmetric rational n×n matrix
 * (one variable: 1×1), multiplier v_η^D (D mod 24) times the Heisenberg character,
 * which is determined by the index and therefore not stored. The class (modular,
 * meromorphic, quasi) is carried beside the type, never inside it: it takes no part
 * in type equality (MATH.md §4).
 */
import {
  type Rational,
  rat,
  radd,

  rmul,
  req,
  rIsInteger,
  rationalToString,
  mod,
  JSBI,
} from '../series/index.js';

export type IndexMatrix = readonly (readonly Rational[])[];

export interface ModularType {
  readonly weight: Rational;
  readonly index: IndexMatrix;
  /** D of v_η^D, reduced to 0..23. */
  readonly etaPower: number;
}

export type FormClass = 'modular' | 'meromorphic' | 'quasi';

export function zeroIndex(n: number): IndexMatrix {
  return Array.from({ length: n }, () => Array.from({ length: n }, () => rat(0)));
}

export function scalarIndex(m: Rational): IndexMatrix {
  return [[m]];
}

/** The type of a non-zero constant in n variables. */
export function constantType(n: number): ModularType {
  return { weight: rat(0), index: zeroIndex(n), etaPower: 0 };
}

function mapIndex(a: IndexMatrix, b: IndexMatrix, f: (x: Rational, y: Rational) => Rational): IndexMatrix {
  return a.map((row, i) => row.map((x, j) => f(x, b[i]![j]!)));
}

/** Type of a product: weights, indices and D add (MATH.md §3). */
export function typeProduct(a: ModularType, b: ModularType): ModularType {
  return {
    weight: radd(a.weight, b.weight),
    index: mapIndex(a.index, b.index, radd),
    etaPower: mod(a.etaPower + b.etaPower, 24),
  };
}

/** Type of f^e for an integer e. */
export function typePower(a: ModularType, e: number): ModularType {
  const r = rat(e);
  return {
    weight: rmul(a.weight, r),
    index: a.index.map((row) => row.map((x) => rmul(x, r))),
    etaPower: mod(a.etaPower * mod(e, 24), 24),
  };
}

export function typeQuotient(a: ModularType, b: ModularType): ModularType {
  return typeProduct(a, typePower(b, -1));
}

/** Index after the linear substitution z ↦ A·z': AᵀMA (one variable: a²m). */
export function typeSubstitute(t: ModularType, A: readonly (readonly number[])[]): ModularType {
  const n = t.index.length;
  const cols = A[0]?.length ?? 0;
  const index: Rational[][] = [];
  for (let i = 0; i < cols; i++) {
    const row: Rational[] = [];
    for (let j = 0; j < cols; j++) {
      let s = rat(0);
      for (let k = 0; k < n; k++) {
        for (let l = 0; l < n; l++) {
          s = radd(s, rmul(rat(A[k]![i]! * A[l]![j]!), t.index[k]![l]!));
        }
      }
      row.push(s);
    }
    index.push(row);
  }
  return { weight: t.weight, index, etaPower: t.etaPower };
}

export function indexEqual(a: IndexMatrix, b: IndexMatrix): boolean {
  return a.length === b.length && a.every((row, i) => row.every((x, j) => req(x, b[i]![j]!)));
}

export function typesEqual(a: ModularType, b: ModularType): boolean {
  return req(a.weight, b.weight) && indexEqual(a.index, b.index) && a.etaPower === b.etaPower;
}

/** How two types differ, one phrase per differing component. */
export function typeDifferences(a: ModularType, b: ModularType): string[] {
  const out: string[] = [];
  if (!req(a.weight, b.weight)) out.push(`weight ${rationalToString(a.weight)} vs ${rationalToString(b.weight)}`);
  if (!indexEqual(a.index, b.index)) out.push(`index ${formatIndex(a.index)} vs ${formatIndex(b.index)}`);
  if (a.etaPower !== b.etaPower) out.push(`multiplier ${multiplierText(a.etaPower)} vs ${multiplierText(b.etaPower)}`);
  return out;
}

/**
 * The Heisenberg character vector c ≡ diag(2M) (mod 2) (MATH.md §3): trivial iff all
 * zero; one variable: present iff 2m is odd.
 */
export function heisenbergCharacter(t: ModularType): number[] {
  return t.index.map((row, i) => {
    const two = rmul(row[i]!, rat(2));
    if (!rIsInteger(two)) return 1;
    return mod(JSBI.toNumber(JSBI.remainder(two.num, JSBI.BigInt(2))), 2);
  });
}

/** 2k ≡ D (mod 2) (MATH.md §3); inferred types always satisfy it. */
export function isConsistent(t: ModularType): boolean {
  const twoK = rmul(t.weight, rat(2));
  if (!rIsInteger(twoK)) return false;
  return mod(JSBI.toNumber(JSBI.remainder(twoK.num, JSBI.BigInt(2))), 2) === mod(t.etaPower, 2);
}

export function multiplierText(D: number): string {
  return D === 0 ? 'trivial' : `eta^${D}`;
}

/** One variable: "3/2"; several: "[[1, 1/2], [1/2, 1]]". */
export function formatIndex(m: IndexMatrix): string {
  if (m.length === 1) return rationalToString(m[0]![0]!);
  return `[${m.map((row) => `[${row.map(rationalToString).join(', ')}]`).join(', ')}]`;
}

export function formatType(t: ModularType): string {
  const parts = [`weight ${rationalToString(t.weight)}`, `index ${formatIndex(t.index)}`];
  if (t.etaPower !== 0) parts.push(`character eta^${t.etaPower}`);
  return `jacobi(${parts.join(', ')})`;
}

/** The scalar index of a one-variable type. */
export function scalarIndexOf(t: ModularType): Rational {
  return t.index.length === 0 ? rat(0) : t.index[0]![0]!;
}

export function indexIsZero(m: IndexMatrix): boolean {
  return m.every((row) => row.every((x) => req(x, rat(0))));
}

