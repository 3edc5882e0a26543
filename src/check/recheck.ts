/**
 * `sturmcheck recheck CERT.json` (CLAIMS.md): re-derive a certificate from its claim
 * and closure alone — parse them as a claim file, check the claim with the exact
 * engine, build the certificate of the fresh verdict — and compare it with the file,
 * step by step in the order of the proof: hashes, parse, verdict, relation,
 * assumptions, types, normal form, bound, route, coefficient count, digest, reason.
 * The first step that disagrees is the answer; nothing the file states is trusted.
 */
import { parseClaimFile, type ParsedClaimFile } from '../lang/index.js';
import { type Certificate } from '../verdict/index.js';
import { checkClaimFile } from './check-file.js';
import type { CheckOptions } from './check-options.js';
import { certificateOf } from './certificate-of.js';
import { readCertificate } from './certificate-shape.js';
import { sha256Hex } from './sha256.js';

export type RecheckStep =
  | 'claim hash'
  | 'closure hash'
  | 'parse'
  | 'verdict'
  | 'relation'
  | 'assumptions'
  | 'type'
  | 'normal form'
  | 'bound'
  | 'route'
  | 'coefficient count'
  | 'digest'
  | 'reason';

export type RecheckResult =
  | { readonly status: 'confirmed'; readonly certificate: Certificate }
  | { readonly status: 'disagrees'; readonly step: RecheckStep; readonly detail: string; readonly certificate: Certificate }
  | { readonly status: 'unusable'; readonly problem: string };

/** The first path at which two JSON values differ, with both values; null when equal. */
function firstDifference(path: string, a: unknown, b: unknown): string | null {
  if (typeof a === 'object' && a !== null && typeof b === 'object' && b !== null && Array.isArray(a) === Array.isArray(b)) {
    const ao = a as Record<string, unknown>;
    const bo = b as Record<string, unknown>;
    const keys = [...new Set([...Object.keys(ao), ...Object.keys(bo)])];
    for (const k of keys) {
      const d = firstDifference(Array.isArray(a) ? `${path}[${k}]` : `${path}.${k}`, ao[k], bo[k]);
      if (d !== null) return d;
    }
    return null;
  }
  if (a === b) return null;
  const show = (v: unknown): string => (v === undefined ? 'nothing' : JSON.stringify(v));
  return `${path}: the certificate says ${show(a)}, re-derived ${show(b)}`;
}

/** Parses the text of a certificate file; `unusable` when it is not JSON or not a certificate. */
export function recheckText(text: string, opts: CheckOptions, toolVersion: string): RecheckResult {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (e) {
    return { status: 'unusable', problem: `not JSON (${e instanceof Error ? e.message : String(e)})` };
  }
  const cert = readCertificate(value);
  if (typeof cert === 'string') return { status: 'unusable', problem: `not a certificate this version reads: ${cert}` };
  return recheck(cert, opts, toolVersion);
}

export function recheck(cert: Certificate, opts: CheckOptions, toolVersion: string): RecheckResult {
  const disagree = (step: RecheckStep, detail: string): RecheckResult => ({ status: 'disagrees', step, detail, certificate: cert });
  if (sha256Hex(cert.claim.text) !== cert.claim.sha256) return disagree('claim hash', 'the SHA-256 of claim.text is not claim.sha256: the claim text was changed');
  if (sha256Hex(cert.closure.text) !== cert.closure.sha256) {
    return disagree('closure hash', 'the SHA-256 of closure.text is not closure.sha256: the closure was changed');
  }
  const source = `${cert.closure.text === '' ? '' : `${cert.closure.text}\n`}${cert.claim.text}\n`;
  const parsed = parseClaimFile(source, cert.claim.file);
  const problem = parsed.diagnostics.find((d) => d.severity === 'error');
  if (problem !== undefined) return disagree('parse', `the closure and the claim do not parse: ${problem.message} (line ${problem.span?.startLine ?? '?'})`);
  const claims = parsed.ast.statements.filter((s) => s.kind === 'claim');
  if (claims.length !== 1 || parsed.ast.statements[parsed.ast.statements.length - 1] !== claims[0]) {
    return disagree('parse', `claim.text must hold exactly one claim, after the closure; found ${claims.length}`);
  }
  // the fresh check takes the certificate's own route, so every recorded step can match
  const fresh = freshCertificate(parsed, cert.route.route, opts, toolVersion);
  if (typeof fresh === 'string') return disagree('verdict', fresh);
  const again = fresh;
  const steps: readonly [RecheckStep, string, unknown, unknown][] = [
    ['relation', 'claim.relation', cert.claim.relation, again.claim.relation],
    ['assumptions', 'assumptions', cert.assumptions, again.assumptions],
    ['type', 'type', cert.type, again.type],
    ['normal form', 'normalForm', cert.normalForm, again.normalForm],
    ['bound', 'bound', cert.bound, again.bound],
    ['route', 'route', cert.route, again.route],
    ['coefficient count', 'comparison.coefficients', cert.comparison?.coefficients, again.comparison?.coefficients],
    ['digest', 'comparison.digest', cert.comparison?.digest, again.comparison?.digest],
    ['reason', 'reason', cert.reason, again.reason],
  ];
  for (const [step, path, recorded, derived] of steps) {
    const d = firstDifference(path, recorded, derived);
    if (d !== null) return disagree(step, d);
  }
  if (cert.route.route === 'modular') {
    // a modular proof is also re-derived through the exact engine: same coefficients
    const exact = freshCertificate(parsed, 'exact', opts, toolVersion);
    if (typeof exact === 'string') return disagree('verdict', `the exact re-derivation: ${exact}`);
    const d = firstDifference('comparison.digest', cert.comparison?.digest, exact.comparison?.digest);
    if (d !== null) return disagree('digest', `the exact re-derivation differs: ${d}`);
  }
  return { status: 'confirmed', certificate: cert };
}

/** The certificate a fresh check by the given arithmetic writes, or why there is none. */
function freshCertificate(parsed: ParsedClaimFile, arithmetic: 'exact' | 'modular', opts: CheckOptions, toolVersion: string): Certificate | string {
  const verdicts = checkClaimFile(parsed.ast, parsed.diagnostics, { ...opts, evidence: true, arithmetic });
  const fileError = verdicts.find((v) => v.claimText === undefined);
  if (fileError !== undefined) return `the closure has an error: ${fileError.reason ?? 'unknown'}`;
  const fresh = verdicts[0]!;
  if (fresh.verdict !== 'proved') return `re-derived ${fresh.verdict}, not proved: ${fresh.reason ?? ''}`.trimEnd();
  return certificateOf(fresh, toolVersion) ?? 'the fresh check recorded no evidence to certify';
}
