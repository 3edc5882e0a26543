/**
 * Bytes → source text: UTF-8 only, BOM stripped, CRLF and CR → LF, so that every
 * later position refers to the same text the diagnostics quote.
 */
import { codes } from './diagnostic-codes.js';
import { diagnostic, type Diagnostic } from './diagnostic.js';
import { spanAtOffset } from './span-of.js';

export type DecodedSource = { readonly ok: true; readonly text: string } | { readonly ok: false; readonly diagnostic: Diagnostic };

export function decodeSource(bytes: Uint8Array, file: string): DecodedSource {
  if (isUtf16(bytes)) return { ok: false, diagnostic: diagnostic(codes.utf16, {}, null) };
  const invalid = firstInvalidUtf8(bytes);
  if (invalid >= 0) return { ok: false, diagnostic: atByte(bytes, invalid, file, codes.notUtf8) };
  const nul = bytes.indexOf(0);
  if (nul >= 0) return { ok: false, diagnostic: atByte(bytes, nul, file, codes.binaryContent) };
  return { ok: true, text: normaliseSource(new TextDecoder('utf-8', { fatal: true }).decode(bytes)) };
}

/** Idempotent: BOM stripped, line ends made LF. */
export function normaliseSource(text: string): string {
  return text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
}

function isUtf16(bytes: Uint8Array): boolean {
  return bytes.length >= 2 && ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff));
}

/** Index of the first byte that does not begin a valid UTF-8 sequence, or -1. */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const length = sequenceLength(bytes, i);
    if (length === 0) return i;
    i += length;
  }
  return -1;
}

/** The length of the well-formed UTF-8 sequence at `i` (RFC 3629 table), 0 if none. */
function sequenceLength(bytes: Uint8Array, i: number): number {
  const b0 = bytes[i]!;
  if (b0 < 0x80) return 1;
  const continuation = (k: number, lo = 0x80, hi = 0xbf): boolean => {
    const b = bytes[i + k];
    return b !== undefined && b >= lo && b <= hi;
  };
  if (b0 >= 0xc2 && b0 <= 0xdf) return continuation(1) ? 2 : 0;
  if (b0 >= 0xe0 && b0 <= 0xef) {
    const lo = b0 === 0xe0 ? 0xa0 : 0x80;
    const hi = b0 === 0xed ? 0x9f : 0xbf;
    return continuation(1, lo, hi) && continuation(2) ? 3 : 0;
  }
  if (b0 >= 0xf0 && b0 <= 0xf4) {
    const lo = b0 === 0xf0 ? 0x90 : 0x80;
    const hi = b0 === 0xf4 ? 0x8f : 0xbf;
    return continuation(1, lo, hi) && continuation(2) && continuation(3) ? 4 : 0;
  }
  return 0;
}

/** A diagnostic positioned at byte `offset`, with line and column of the valid prefix. */
function atByte(bytes: Uint8Array, offset: number, file: string, template: typeof codes.notUtf8): Diagnostic {
  const prefix = normaliseSource(new TextDecoder('utf-8').decode(bytes.subarray(0, offset)));
  const byte = bytes[offset]!.toString(16).padStart(2, '0').toUpperCase();
  return diagnostic(template, { byte, offset }, spanAtOffset(prefix + ' ', prefix.length, 1, file));
}
