import { describe, expect, test } from 'vitest';
import { builtinNames, parseExpression } from '../../src/lang/index.js';
import { stripSpans } from './strip-spans.js';

function codes(text: string, variables: readonly string[] = ['z']): string[] {
  return parseExpression(text, variables).diagnostics.map((d) => d.code);
}

describe('parseExpression', () => {
  test('empty input is an error', () => {
    for (const text of ['', '   ', '# only a comment', '\n\n']) {
      const { expr, diagnostics } = parseExpression(text, ['z']);
      expect(expr).toBeNull();
      expect(diagnostics.map((d) => d.message)).toEqual(['empty expression']);
    }
  });

  test('classifies built-ins, operators and substitutions', () => {
    const { expr } = parseExpression('V_2(phi_{0,1}(2z)) - wp(z)', ['z']);
    expect(stripSpans(expr)).toEqual({
      kind: 'binary',
      op: '-',
      left: {
        kind: 'hecke',
        op: 'V',
        level: 2,
        arg: {
          kind: 'substitute',
          target: { kind: 'namedForm', name: 'phi_{0,1}' },
          args: [{ coeffs: { z: 2 } }],
          allZero: false,
        },
      },
      right: { kind: 'wp', arg: { coeffs: { z: 1 } } },
    });
  });

  test('linear forms in several variables', () => {
    const { expr } = parseExpression('theta(3 z1 + z2 - 2*z1)', ['z1', 'z2']);
    expect(stripSpans(expr)).toEqual({ kind: 'theta', arg: { coeffs: { z1: 1, z2: 1 } } });
    expect(stripSpans(parseExpression('theta(z1 - z1)', ['z1', 'z2']).expr)).toEqual({ kind: 'theta', arg: { coeffs: {} } });
  });

  test('E4 and E6 mean E_4 and E_6; E_{4} is E_4', () => {
    for (const [text, weight] of [['E4', 4], ['E6', 6], ['E_{4}', 4], ['E_{ 1 2 }', 12]] as const) {
      expect(stripSpans(parseExpression(text, ['z']).expr)).toEqual({ kind: 'eisenstein', weight });
    }
  });

  test('errors with their codes', () => {
    expect(codes('2 E_4')).toEqual(['SC-N005']);
    expect(codes('E_10')).toEqual(['SC-L004']);
    expect(codes('(E_4)(2z)')).toEqual(['SC-N007']);
    expect(codes('eta(2tau)')).toEqual(['SC-N010']);
    expect(codes('E_5 + E_{2,1}')).toEqual(['SC-N008', 'SC-N009']);
    expect(codes('z')).toEqual(['SC-N006']);
    expect(codes('eta^(1/2)')).toEqual(['SC-P005']);
    expect(codes('theta(z')).toEqual(['SC-P003']);
    expect(codes('Theta[E8](0)')).toEqual(['SC-N014']);
  });

  test('an unclosed bracket names its opener', () => {
    const [d] = parseExpression('E_4 * theta(2z', ['z']).diagnostics;
    expect(d?.message).toBe("expected ')' to close 'theta(' opened at 1:12");
  });

  test('builtinNames lists canonical spellings', () => {
    const names = builtinNames();
    expect(names).toContain('phi_{-2,1}');
    expect(names).toContain('E_{10}');
    for (const name of names.filter((n) => n !== 'Theta' && !/^[VUT]_|^(theta|wp|heat|serre|Dq|Dz|taylor)$/.test(n))) {
      expect(parseExpression(name, ['z']).diagnostics, name).toEqual([]);
    }
  });
});
