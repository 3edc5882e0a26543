import { describe, expect, test } from 'vitest';
import { parseClaimFile } from '../../src/lang/index.js';

function statementLines(text: string): number[] {
  const { ast, diagnostics } = parseClaimFile(text, 'l.claim');
  expect(diagnostics.map((d) => d.message)).toEqual([]);
  return ast.statements.map((s) => s.span.startLine);
}

describe('statement boundaries', () => {
  test('each trailing operator continues the statement', () => {
    for (const op of ['+', '-', '*', '·', '/', '==', ',']) {
      const body = op === '==' ? 'claim: E_4 ==\nE_4\n' : op === ',' ? 'variables x,\ny\n' : `let A = E_4 ${op}\nE_4\n`;
      expect(statementLines(body), op).toEqual([1]);
    }
    expect(statementLines('let A = eta^\n2\n')).toEqual([1]);
    expect(statementLines('claim:\nE_4 == E_4\n')).toEqual([1]);
  });

  test('a comment after the operator does not matter', () => {
    expect(statementLines('let A = E_4 + # more follows\n  # and a comment line\n\nE_6\nclaim: A == A\n')).toEqual([1, 5]);
  });

  test('deeper indentation continues, equal indentation does not', () => {
    expect(statementLines('  let A = E_4\n    * E_6\n  let B = A\n')).toEqual([1, 3]);
  });

  test('a column-1 keyword starts a statement even inside brackets', () => {
    const { ast, diagnostics } = parseClaimFile('let A = (E_4\nlet B = E_6\n', 'k.claim');
    expect(ast.statements.map((s) => s.span.startLine)).toEqual([2]);
    expect(diagnostics.map((d) => d.code)).toEqual(['SC-P003']);
  });

  test('an indented keyword inside brackets does not', () => {
    expect(statementLines('let A = (E_4\n  ) * E_6\nlet B = A\n')).toEqual([1, 3]);
  });

  test('keywords win only as whole words', () => {
    expect(statementLines('let lettuce = E_4\nlet claimed = lettuce\n')).toEqual([1, 2]);
  });
});
