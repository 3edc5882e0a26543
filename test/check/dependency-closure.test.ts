/** The dependency closure a certificate carries (check/dependency-closure.ts). */
import { describe, expect, it } from 'vitest';
import { parseClaimFile } from '../../src/lang/index.js';
import { dependencyClosure } from '../../src/check/index.js';

const FILE = `# a notebook page
variables z1, z2
lattice A2 = [[2, -1], [-1, 2]]
lattice D4 = [[2, 0, 0, -1], [0, 2, 0, -1], [0, 0, 2, -1], [-1, -1, -1, 2]]
let T(u, v) = theta(u) * theta(v) *
   theta(u + v) / eta
let unused = E_4
let S = T(z1, z2) + T(z2, z1)
let G = Dq(E_4)
assume G is jacobi(weight 6, index [[0, 0], [0, 0]])
let W = Theta[A2](z1, z2)
claim "uses S": S == 2 * T(z1, z2)
claim "uses G": G * E_4 == G * E_4
claim "uses a lattice by name": W is jacobi(weight 1, lattice A2)
claim "uses nothing": E_4^2 == E_8
`;

function closureOf(name: string): string {
  const { ast } = parseClaimFile(FILE, 'page.claim');
  const claim = ast.statements.find((s) => s.kind === 'claim' && s.name === name);
  if (claim === undefined || claim.kind !== 'claim') throw new Error(`no claim ${name}`);
  return dependencyClosure(ast, claim);
}

describe('dependency closure', () => {
  it('follows definitions transitively, keeps file order and multi-line statements whole', () => {
    expect(closureOf('uses S')).toBe('variables z1, z2\nlet T(u, v) = theta(u) * theta(v) *\n   theta(u + v) / eta\nlet S = T(z1, z2) + T(z2, z1)');
  });

  it('brings the assume about a definition it uses', () => {
    expect(closureOf('uses G')).toBe('variables z1, z2\nlet G = Dq(E_4)\nassume G is jacobi(weight 6, index [[0, 0], [0, 0]])');
  });

  it('brings the lattices named in definitions and in the asserted type, and no other', () => {
    expect(closureOf('uses a lattice by name')).toBe('variables z1, z2\nlattice A2 = [[2, -1], [-1, 2]]\nlet W = Theta[A2](z1, z2)');
  });

  it('is just the variables line for a claim on built-ins', () => {
    expect(closureOf('uses nothing')).toBe('variables z1, z2');
  });

  it('parses as a file of its own together with the claim', () => {
    const text = `${closureOf('uses S')}\nclaim "uses S": S == 2 * T(z1, z2)\n`;
    const parsed = parseClaimFile(text, 'alone.claim');
    expect(parsed.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
  });
});
