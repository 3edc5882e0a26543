import { describe, expect, test } from 'vitest';
import { readName } from '../../src/lang/names.js';
import { editDistance, nearestName } from '../../src/lang/suggest.js';
import { parseClaimFile } from '../../src/lang/index.js';
import { stripSpans } from './strip-spans.js';

describe('names', () => {
  test('subscripts are normalised: spaces stripped, U+2212 → -, braces only when needed', () => {
    expect(readName('E_{4}').canonical).toBe('E_4');
    expect(readName('E_4').canonical).toBe('E_4');
    expect(readName('phi_{ −2 , 1 }').canonical).toBe('phi_{-2,1}');
    expect(readName('φ_{0,3/2}').canonical).toBe('phi_{0,3/2}');
    expect(readName('ϑ').canonical).toBe('theta');
  });

  test('a bare subscript of several characters is a problem with a suggestion', () => {
    expect(readName('E_10').problem).toEqual({ kind: 'unbracedLong', suggestion: 'E_{10}' });
    expect(readName('E_{}').problem).toEqual({ kind: 'emptySubscript' });
    expect(readName('E_{4,1').problem).toEqual({ kind: 'unclosedBrace' });
  });

  test('suggestions: near names only', () => {
    expect(editDistance('thta', 'theta')).toBe(1);
    expect(editDistance('Dtla', 'Delta')).toBe(2);
    expect(nearestName('thta', ['eta', 'theta'])).toBe('theta');
    expect(nearestName('DELTA', ['Delta'])).toBe('Delta');
    expect(nearestName('xyzzy', ['theta', 'eta'])).toBeNull();
  });
});

describe('resolution', () => {
  test('a let with parameters sees only them; its uses substitute linear forms', () => {
    const { ast, diagnostics } = parseClaimFile('variables x, y\nlet F(u) = theta(2u)\nclaim: F(x - y) == F(0)\n', 'r.claim');
    expect(diagnostics).toEqual([]);
    expect(stripSpans(ast.statements[2])).toMatchObject({
      relation: {
        left: { kind: 'substitute', target: { kind: 'ref', name: 'F' }, args: [{ coeffs: { x: 1, y: -1 } }], allZero: false },
        right: { kind: 'substitute', target: { kind: 'ref', name: 'F' }, args: [], allZero: true },
      },
    });
    const inside = parseClaimFile('variables x\nlet F(u) = theta(x)\n', 'r.claim').diagnostics;
    expect(inside.map((d) => d.code)).toEqual(['SC-N013']);
  });

  test('a parameterless let takes the file variables in order', () => {
    const ok = parseClaimFile('variables x, y\nlet G = theta(x + y)\nclaim: G(y, x) == G\n', 'r.claim');
    expect(ok.diagnostics).toEqual([]);
    const bad = parseClaimFile('variables x, y\nlet G = theta(x + y)\nclaim: G(y) == G\n', 'r.claim');
    expect(bad.diagnostics.map((d) => d.message)).toEqual(["'G' takes 2 linear forms, found 1"]);
  });

  test('Theta[L] takes one linear form per rank of L', () => {
    const text = 'lattice L = [[2, 1], [1, 2]]\nclaim: Theta[L](z, 2z) == Theta[L](z)\n';
    expect(parseClaimFile(text, 'r.claim').diagnostics.map((d) => d.message)).toEqual(["'Theta[L]' takes 2 linear forms, found 1"]);
  });

  test('file variables default to z', () => {
    expect(parseClaimFile('claim: theta(z) == 0\n', 'r.claim').ast.variables).toEqual(['z']);
  });
});
