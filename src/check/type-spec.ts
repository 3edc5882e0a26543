/** A written TYPE (`jacobi(weight W, index I[, character eta^D]) [qualifier]`) as a ModularType. */
import { parseRational, rat, rdiv, mod, type Rational } from '../series/index.js';
import type { TypeSpec } from '../lang/ast.js';
import { type ModularType, isConsistent, formatType } from '../types/index.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

function literal(text: string): Rational {
  const r = parseRational(text);
  if (r === undefined) throw evalError(evalCodes.internal, { detail: `bad rational literal ${text}` }, null);
  return r;
}

export function typeFromSpec(
  spec: TypeSpec,
  nvars: number,
  lattices: ReadonlyMap<string, readonly (readonly number[])[]> = new Map(),
): ModularType {
  const weight = literal(spec.weight);
  let index: Rational[][];
  switch (spec.index.kind) {
    case 'scalar':
      index = [[literal(spec.index.value)]];
      break;
    case 'matrix':
      index = spec.index.matrix.rows.map((row) => row.map(literal));
      break;
    case 'latticeMatrix':
      index = spec.index.gram.rows.map((row) => row.map((x) => rdiv(literal(x), rat(2))));
      break;
    case 'latticeName': {
      const G = lattices.get(spec.index.name);
      if (G === undefined) throw evalError(evalCodes.internal, { detail: `unresolved lattice ${spec.index.name}` }, spec.index.span);
      index = G.map((row) => row.map((x) => rat(x, 2)));
      break;
    }
  }
  if (index.length !== nvars) {
    throw evalError(evalCodes.indexSize, { size: index.length, nvars }, spec.span);
  }
  const t: ModularType = { weight, index, etaPower: mod(spec.character ?? 0, 24) };
  if (!isConsistent(t)) throw evalError(evalCodes.inconsistentType, { type: formatType(t) }, spec.span);
  return t;
}
