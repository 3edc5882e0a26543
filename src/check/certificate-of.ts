/**
 * A proved verdict → its certificate (verdict/certificate.ts). The verdict must have
 * been checked with `evidence` on, so that it carries the claim's closure, the bound's
 * parameters and the digest; `recheck` builds the same record from a fresh check and
 * compares the two field by field, so everything a certificate states comes from here.
 */
import {
  type Certificate,
  type CertificateBound,
  type CertificateNormalForm,
  type NormalFormRecord,
  type Verdict,
  CERTIFICATE_FORMAT,
  CERTIFICATE_FORMAT_VERSION,
  COEFFICIENT_LIST_NAME,
} from '../verdict/index.js';
import { sha256Hex } from './sha256.js';

function normalFormOf(nf: NormalFormRecord): CertificateNormalForm {
  return {
    compared: nf.compared,
    ...(nf.leftMultipliedBy === undefined ? {} : { leftMultipliedBy: nf.leftMultipliedBy }),
    ...(nf.rightMultipliedBy === undefined ? {} : { rightMultipliedBy: nf.rightMultipliedBy }),
    left: { text: nf.left, coefficient: nf.leftCoefficient ?? '1', factors: [...(nf.leftFactors ?? [])] },
    right: { text: nf.right, coefficient: nf.rightCoefficient ?? '1', factors: [...(nf.rightFactors ?? [])] },
    type: nf.type,
  };
}

function boundOf(v: Verdict): CertificateBound | undefined {
  const b = v.bound;
  if (b === undefined || b.parameters === undefined || b.marginTo === undefined) return undefined;
  return { theorem: b.theorem, ...b.parameters, qOrder: b.qOrder, derivation: b.derivation, marginTo: b.marginTo };
}

/** The certificate of a proved claim, or null for any other verdict (or a run without evidence). */
export function certificateOf(v: Verdict, toolVersion: string): Certificate | null {
  if (v.verdict !== 'proved' || v.claimText === undefined || v.closure === undefined || v.relation === undefined) return null;
  const bound = boundOf(v);
  const compared = bound !== undefined && v.evidence !== undefined;
  return {
    format: CERTIFICATE_FORMAT,
    formatVersion: CERTIFICATE_FORMAT_VERSION,
    tool: { name: 'sturmcheck', version: toolVersion },
    claim: { name: v.name, file: v.file, line: v.line, relation: v.relation, text: v.claimText, sha256: sha256Hex(v.claimText) },
    closure: { text: v.closure, sha256: sha256Hex(v.closure) },
    verdict: 'proved',
    assumptions: [...v.assumptions],
    ...(v.type === undefined ? {} : { type: v.type }),
    ...(v.normalForm === undefined ? {} : { normalForm: normalFormOf(v.normalForm) }),
    ...(compared ? { bound } : {}),
    route: v.route === undefined ? { route: 'exact' } : { route: 'modular', primes: [...v.route.primes], heightBits: v.route.heightBits },
    ...(compared
      ? { comparison: { coefficients: v.evidence.coefficients, digest: { algorithm: 'sha256', list: COEFFICIENT_LIST_NAME, value: v.evidence.sha256 } } }
      : {}),
    ...(v.reason === undefined ? {} : { reason: v.reason }),
  };
}
