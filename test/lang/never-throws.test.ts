/** No input makes the front end throw: every problem must come back as a diagnostic. */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { parseClaimFile, parseExpression } from '../../src/lang/index.js';

/** Pieces of the language itself, so that random inputs get deep into the parser. */
const LANGUAGE_PIECES = [
  'let', 'claim', 'assume', 'lattice', 'variables', 'expect', 'proved', 'refuted', 'unproved', 'is',
  'jacobi', 'weight', 'index', 'character', 'weak', 'holomorphic', 'cusp', 'Theta', 'tau', 'τ',
  'theta', 'ϑ', 'eta', 'η', 'Delta', 'Δ', 'E_4', 'E4', 'E_{4,1}', 'E_10', 'E_{10}', 'phi_{-2,1}', 'φ_{0,1}',
  'wp', '℘', 'V_2', 'T_{11}', 'heat', 'serre', 'Dq', 'Dz', 'taylor', 'z', 'z1', 'z2', 'f_1', 'A', 'F',
  '0', '1', '2', '144', '3/2', '1.5', '"name"', '"bad\\q"', '"open',
  '(', ')', '[', ']', '[[', ']]', '{', '}', '_2', '_{10}', '_', ',', ':', '=', '==', '+', '-', '−', '*', '·',
  '/', '^', '#c', ' ', '  ', '\t', '\n', '\r\n', '\n  ', '\uFEFF', 'α', '\u0000',
];

const languageLike = fc.array(fc.constantFrom(...LANGUAGE_PIECES), { maxLength: 60 }).map((pieces) => pieces.join(''));
const spaced = fc.array(fc.constantFrom(...LANGUAGE_PIECES), { maxLength: 40 }).map((pieces) => pieces.join(' '));
const anyText = fc.string({ unit: 'binary', maxLength: 200 });

function neverThrows(text: string): void {
  const file = parseClaimFile(text, 'p.claim');
  // The front end catches its own faults as SC-I001; none may occur.
  expect(file.diagnostics.filter((d) => d.code === 'SC-I001')).toEqual([]);
  const expression = parseExpression(text, ['z', 'z1']);
  expect(expression.diagnostics.filter((d) => d.code === 'SC-I001')).toEqual([]);
  expect(expression.expr === null || expression.diagnostics.length === 0).toBe(true);
}

describe('the front end never throws', () => {
  test('on arbitrary Unicode text', () => {
    fc.assert(fc.property(anyText, neverThrows), { numRuns: 300 });
  });

  test('on strings built from the language tokens', () => {
    fc.assert(fc.property(languageLike, neverThrows), { numRuns: 1000 });
    fc.assert(fc.property(spaced, neverThrows), { numRuns: 1000 });
  });

  test('on statements with a random tail', () => {
    const statement = fc.tuple(fc.constantFrom('claim: ', 'let A = ', 'let F(u) = ', 'assume A is ', 'lattice L = '), spaced);
    fc.assert(fc.property(statement, ([head, tail]) => neverThrows(head + tail)), { numRuns: 1000 });
  });

  test('every kept statement has no diagnostic inside its span', () => {
    fc.assert(
      fc.property(languageLike, (text) => {
        const { ast, diagnostics } = parseClaimFile(text, 'p.claim');
        for (const s of ast.statements) {
          const inside = diagnostics.filter(
            (d) => d.span && d.span.startOffset >= s.span.startOffset && d.span.endOffset <= s.span.endOffset,
          );
          expect(inside).toEqual([]);
        }
      }),
      { numRuns: 500 },
    );
  });
});
