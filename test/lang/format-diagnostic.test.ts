import { describe, expect, test } from 'vitest';
import { diagnostic, formatDiagnostic, langDiagnostics, parseClaimFile } from '../../src/lang/index.js';

describe('formatDiagnostic', () => {
  test('position, code, message, source line, caret under the token, notes', () => {
    const text = 'let A = E_4\nclaim: thta(z) == A\n';
    const { diagnostics } = parseClaimFile(text, 'n.claim');
    expect(diagnostics.map((d) => formatDiagnostic(d, text))).toEqual([
      [
        "n.claim:2:8: error SC-N001: unknown name 'thta'",
        'claim: thta(z) == A',
        '       ^~~~',
        "note: did you mean 'theta'?",
      ].join('\n'),
    ]);
  });

  test('the unclosed bracket is reported at the column-1 keyword', () => {
    const text = 'let A = theta(z\nclaim: E_4 == E_4\n';
    const { ast, diagnostics } = parseClaimFile(text, 'u.claim');
    expect(ast.statements.map((s) => s.kind)).toEqual(['claim']);
    expect(formatDiagnostic(diagnostics[0]!, text)).toBe(
      [
        "u.claim:2:1: error SC-P003: expected ')' to close 'theta(' opened at 1:14",
        'claim: E_4 == E_4',
        '^~~~~',
        'note: a statement keyword in column 1 always starts a new statement',
      ].join('\n'),
    );
  });

  test('tabs before the token are kept so that the caret lines up', () => {
    const text = '\tclaim: x == 0\n';
    const [d] = parseClaimFile(text, 't.claim').diagnostics;
    expect(formatDiagnostic(d!, text).split('\n')[2]).toBe('\t       ^');
  });

  test('a diagnostic without a position prints its header only', () => {
    const d = diagnostic(langDiagnostics.utf16, {}, null);
    expect(formatDiagnostic(d, '')).toBe('error SC-L012: the file is UTF-16 text; save it as UTF-8');
  });
});
