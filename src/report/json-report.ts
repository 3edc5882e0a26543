/**
 * `check --format json`: exactly the object of CLAIMS.md, `{ tool, version, claims,
 * summary }`. Each claim is copied field by field so that internal parts of the
 * verdict record (normal form, diagnostics, claim text, the bound's derivation) never
 * leak into a format others parse, and absent fields are omitted, not null.
 */
import { summarize, type BoundRecord, type Summary, type Verdict, type TypeRecord, type MismatchRecord } from '../verdict/index.js';
import type { Reporter, ReportInput } from './reporter.js';

export interface ClaimJson {
  file: string;
  line: number;
  name: string;
  verdict: Verdict['verdict'];
  expected: Verdict['expected'];
  type?: TypeRecord;
  leftType?: TypeRecord;
  rightType?: TypeRecord;
  compared?: 'sides' | 'cross-multiplied';
  assumptions: string[];
  bound?: { theorem: BoundRecord['theorem']; qOrder: string; coefficientsChecked: number };
  mismatch?: MismatchRecord;
  reason?: string;
  seconds: number;
}

export interface CheckJson {
  tool: 'sturmcheck';
  version: string;
  claims: ClaimJson[];
  summary: Summary;
}

/** Milliseconds are the resolution a reader of timings needs; more digits are noise. */
export function roundSeconds(s: number): number {
  return Math.round(s * 1000) / 1000;
}

function boundJson(b: BoundRecord): NonNullable<ClaimJson['bound']> {
  return { theorem: b.theorem, qOrder: b.qOrder, coefficientsChecked: b.coefficientsChecked };
}

function mismatchJson(m: MismatchRecord): MismatchRecord {
  return { q: m.q, zeta: [...m.zeta], left: m.left, right: m.right };
}

/** `{ key: value }` when the value is present, `{}` otherwise: absent fields are omitted. */
function present<K extends string, V>(key: K, value: V | undefined): Partial<Record<K, V>> {
  return value === undefined ? {} : ({ [key]: value } as Partial<Record<K, V>>);
}

/** Fields in the order CLAIMS.md lists them, so the output reads like the contract. */
export function claimJson(v: Verdict): ClaimJson {
  // CLAIMS.md: leftType/rightType only when refuted by type.
  const byType = v.verdict === 'refuted' && v.leftType !== undefined && v.rightType !== undefined;
  return {
    file: v.file,
    line: v.line,
    name: v.name,
    verdict: v.verdict,
    expected: v.expected,
    ...present('type', v.type),
    ...present('leftType', byType ? v.leftType : undefined),
    ...present('rightType', byType ? v.rightType : undefined),
    ...present('compared', v.compared),
    assumptions: [...v.assumptions],
    ...present('bound', v.bound === undefined ? undefined : boundJson(v.bound)),
    ...present('mismatch', v.mismatch === undefined ? undefined : mismatchJson(v.mismatch)),
    ...present('reason', v.reason),
    seconds: roundSeconds(v.seconds),
  };
}

export function checkJson(input: ReportInput): CheckJson {
  return { tool: 'sturmcheck', version: input.toolVersion, claims: input.verdicts.map(claimJson), summary: summarize(input.verdicts) };
}

export const jsonReporter: Reporter = {
  render: (input) => `${JSON.stringify(checkJson(input), null, 2)}\n`,
};
