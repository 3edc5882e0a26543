/**
 * One discovered claim file → its verdicts. The file is read as bytes and decoded
 * by the front end, so binary or non-UTF-8 content becomes a file-level `error`
 * entry with a clear message; only a file that cannot be read at all is a problem
 * of the command line (exit 2).
 */
import { readFileSync } from 'node:fs';
import { decodeSource, parseClaimFile, type Diagnostic } from '../lang/index.js';
import { normaliseSource } from '../lang/decode-source.js';
import { checkClaimFile, type CheckListener, type CheckOptions } from '../check/index.js';
import type { Verdict } from '../verdict/index.js';
import type { ClaimFilePath } from './discover.js';

export type PathResult =
  | { readonly ok: true; readonly verdicts: Verdict[]; readonly text: string }
  | { readonly ok: false; readonly problem: string };

function undecodableFile(file: string, d: Diagnostic): Verdict {
  const line = d.span?.startLine ?? 1;
  return { file, line, name: `${file}:${line}`, verdict: 'error', expected: 'proved', assumptions: [], reason: d.message, seconds: 0, diagnostics: [d] };
}

export function checkPath(path: ClaimFilePath, opts: CheckOptions, listener: CheckListener): PathResult {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path.absolute);
  } catch (e) {
    const code = typeof e === 'object' && e !== null && 'code' in e ? String(e.code) : '';
    return { ok: false, problem: `cannot read ${path.display}${code === '' ? '' : ` (${code})`}` };
  }
  const decoded = decodeSource(bytes, path.display);
  if (!decoded.ok) {
    // A lossy decoding only serves to quote the offending line under the diagnostic.
    const quoted = normaliseSource(new TextDecoder('utf-8').decode(bytes));
    return { ok: true, verdicts: [undecodableFile(path.display, decoded.diagnostic)], text: quoted };
  }
  const parsed = parseClaimFile(decoded.text, path.display);
  return { ok: true, verdicts: checkClaimFile(parsed.ast, parsed.diagnostics, opts, listener), text: parsed.ast.text };
}
