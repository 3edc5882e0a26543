/**
 * The theta series of a declared lattice as an atom (MATH.md §2): Θ_G has weight n/2,
 * index G/2 in its n variables. It is level one only when det G = 1 (E8 and sums of
 * it); otherwise its level N (the least N with N·G⁻¹ even) is outside Theorems A and B
 * (MATH.md §6), so the atom is given no proven type and claims using it are unproved.
 */
import { rat, rdiv, rmul, lcm, int, JSBI, toNumber, rIsInteger, rationalToString, cached, source } from '../series/index.js';
import { determinant, matrixInverse, type ModularType } from '../types/index.js';
import { latticeThetaSeries } from '../forms/lattice-theta.js';
import type { Atom, Monomial } from './atom.js';
import { atomMonomial } from './monomial.js';
import { substitutedAtom } from './substituted-atom.js';

/** The level of an even lattice: the least N with N·G⁻¹ integral and of even diagonal. */
export function latticeLevel(G: readonly (readonly number[])[]): number {
  const inv = matrixInverse(G.map((row) => row.map((x) => rat(x))))!;
  let N = int(1);
  inv.forEach((row, i) =>
    row.forEach((x, j) => {
      N = lcm(N, x.den);
      if (i === j) N = lcm(N, rdiv(x, rat(2)).den);
    }),
  );
  return toNumber(N);
}

export function latticeThetaAtom(name: string, G: readonly (readonly number[])[]): Atom {
  const n = G.length;
  const det = determinant(G.map((row) => row.map((x) => rat(x))));
  const unimodular = rIsInteger(det) && JSBI.equal(det.num, int(1));
  const type: ModularType = {
    weight: rat(n, 2),
    index: G.map((row) => row.map((x) => rmul(rat(x), rat(1, 2)))),
    etaPower: n % 2,
  };
  const reason = unimodular
    ? null
    : `Theta[${name}] has level ${latticeLevel(G)} (det G = ${rationalToString(det)}); level N is not covered by Theorems A and B, so it has no proven type here`;
  const atom: Atom = {
    key: `Theta[${name}]`,
    kind: 'other',
    type,
    cls: unimodular ? 'modular' : 'quasi',
    quasiReason: reason,
    source: cached(source(rat(0), (X) => latticeThetaSeries(G, X))),
    valuationExact: true,
    thetaL: null,
    substitute: (A: readonly (readonly number[])[]): Monomial => atomMonomial(substitutedAtom(atom, A)),
  };
  return atom;
}
