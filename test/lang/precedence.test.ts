import { describe, expect, test } from 'vitest';
import { parseExpression } from '../../src/lang/index.js';
import { stripSpans } from './strip-spans.js';

function tree(text: string): unknown {
  const { expr, diagnostics } = parseExpression(text, ['z']);
  expect(diagnostics).toEqual([]);
  return stripSpans(expr);
}

const eta = { kind: 'eta' };
const num = (value: string) => ({ kind: 'number', value });

describe('operator precedence', () => {
  test('unary minus binds looser than ^: -eta^2 = -(eta^2)', () => {
    expect(tree('-eta^2')).toEqual({ kind: 'neg', operand: { kind: 'power', base: eta, exponent: '2' } });
  });

  test('^ is right-associative: a^b^c = a^(b^c)', () => {
    // Exponents are integers, so b^c is evaluated: 2^3^2 = 2^9, not (2^3)^2 = 2^6.
    expect(tree('eta^3^2')).toEqual({ kind: 'power', base: eta, exponent: '9' });
    expect(tree('2^3^2')).toEqual({ kind: 'power', base: num('2'), exponent: '9' });
  });

  test('* and / are left-associative: 2*3/4 = (2*3)/4', () => {
    expect(tree('2*3/4')).toEqual({
      kind: 'binary',
      op: '/',
      left: { kind: 'binary', op: '*', left: num('2'), right: num('3') },
      right: num('4'),
    });
  });

  test('+ and - are left-associative and looser than *', () => {
    expect(tree('1 - 2 + 3*4')).toEqual({
      kind: 'binary',
      op: '+',
      left: { kind: 'binary', op: '-', left: num('1'), right: num('2') },
      right: { kind: 'binary', op: '*', left: num('3'), right: num('4') },
    });
  });

  test('negative exponents in every accepted spelling', () => {
    for (const text of ['eta^-6', 'eta^(-6)', 'eta^{-6}', 'eta^−6', 'η^-(6)']) {
      expect(tree(text)).toEqual({ kind: 'power', base: eta, exponent: '-6' });
    }
    expect(tree('eta^{18}')).toEqual({ kind: 'power', base: eta, exponent: '18' });
  });

  test('a minus after an operator is unary', () => {
    expect(tree('eta * -eta')).toEqual({ kind: 'binary', op: '*', left: eta, right: { kind: 'neg', operand: eta } });
  });

  test('· and ⋅ are *', () => {
    expect(tree('eta·eta')).toEqual(tree('eta*eta'));
    expect(tree('eta⋅eta')).toEqual(tree('eta*eta'));
  });
});
