import { describe, expect, test } from 'vitest';
import { decodeSource, parseClaimFile } from '../../src/lang/index.js';

const utf8 = (s: string) => new TextEncoder().encode(s);

describe('decodeSource', () => {
  test('strips a BOM and makes line ends LF', () => {
    expect(decodeSource(utf8('\uFEFFa\r\nb\rc\n'), 'f')).toEqual({ ok: true, text: 'a\nb\nc\n' });
  });

  test('keeps non-ASCII text', () => {
    expect(decodeSource(utf8('ϑ η ℘ −'), 'f')).toEqual({ ok: true, text: 'ϑ η ℘ −' });
  });

  test('rejects invalid UTF-8 with the position of the bad byte', () => {
    const result = decodeSource(new Uint8Array([0x61, 0x0a, 0x62, 0xc3, 0x28]), 'f.claim');
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.diagnostic.code).toBe('SC-L010');
      expect(result.diagnostic.span?.startLine).toBe(2);
      expect(result.diagnostic.span?.startColumn).toBe(2);
    }
  });

  test('rejects overlong encodings and surrogates', () => {
    for (const bytes of [[0xc0, 0xaf], [0xed, 0xa0, 0x80], [0xf4, 0x90, 0x80, 0x80]]) {
      const result = decodeSource(new Uint8Array(bytes), 'f');
      expect(result.ok ? 'ok' : result.diagnostic.code).toBe('SC-L010');
    }
  });

  test('rejects binary content and UTF-16', () => {
    const nul = decodeSource(new Uint8Array([0x61, 0x00, 0x62]), 'f');
    expect(nul.ok ? 'ok' : nul.diagnostic.code).toBe('SC-L011');
    const utf16 = decodeSource(new Uint8Array([0xff, 0xfe, 0x61, 0x00]), 'f');
    expect(utf16.ok ? 'ok' : utf16.diagnostic.code).toBe('SC-L012');
  });

  test('CRLF and LF files give the same statements and positions', () => {
    const lf = 'claim "a": E_4 ==\n  E_4\nclaim: E_6 == E_6\n';
    const crlf = decodeSource(utf8(`\uFEFF${lf.replace(/\n/g, '\r\n')}`), 'f');
    expect(crlf.ok).toBe(true);
    if (crlf.ok) expect(parseClaimFile(crlf.text, 'f').ast).toEqual(parseClaimFile(lf, 'f').ast);
    // parseClaimFile normalises too, for callers that skip decodeSource.
    expect(parseClaimFile(lf.replace(/\n/g, '\r\n'), 'f').ast).toEqual(parseClaimFile(lf, 'f').ast);
  });
});
