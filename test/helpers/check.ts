/** Checks claim-file text in-process. */
import { parseClaimFile } from '../../src/lang/index.js';
import { checkClaimFile, DEFAULT_CHECK_OPTIONS, type CheckOptions } from '../../src/check/index.js';
import type { Verdict } from '../../src/verdict/index.js';

export function checkText(text: string, opts: Partial<CheckOptions> = {}, file = 'test.claim'): Verdict[] {
  const parsed = parseClaimFile(text, file);
  return checkClaimFile(parsed.ast, parsed.diagnostics, { ...DEFAULT_CHECK_OPTIONS, ...opts });
}

/** The single verdict of a one-claim text `claim: RELATION`. */
export function checkOne(relation: string, opts: Partial<CheckOptions> = {}, preamble = ''): Verdict {
  const vs = checkText(`${preamble}\nclaim: ${relation}\n`, opts);
  if (vs.length !== 1) throw new Error(`expected one verdict, got ${JSON.stringify(vs.map((v) => [v.verdict, v.reason]))}`);
  return vs[0]!;
}
