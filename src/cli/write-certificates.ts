/**
 * `check --certificates DIR`: one JSON certificate per proved claim, named by the rule
 * of check/certificate-file-names.ts, each written atomically. DIR is created when
 * missing; files already there are replaced only by complete new ones, and other
 * files are left alone.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { certificateFileNames, certificateOf } from '../check/index.js';
import type { Verdict } from '../verdict/index.js';
import { writeFileAtomic } from './atomic-write.js';

export interface CertificatesWritten {
  readonly written: readonly string[];
  /** What could not be written, one message each. */
  readonly problems: readonly string[];
}

function message(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

export function writeCertificates(dir: string, verdicts: readonly Verdict[], toolVersion: string): CertificatesWritten {
  try {
    mkdirSync(dir, { recursive: true });
  } catch (e) {
    return { written: [], problems: [`cannot create ${dir}: ${message(e)}`] };
  }
  // Names are given to every claim (file-level errors have no claim text), proved or not.
  const claims = verdicts.filter((v) => v.claimText !== undefined);
  const names = certificateFileNames(claims);
  const written: string[] = [];
  const problems: string[] = [];
  claims.forEach((v, i) => {
    const cert = certificateOf(v, toolVersion);
    if (cert === null) return;
    const path = join(dir, names[i]!);
    try {
      writeFileAtomic(path, `${JSON.stringify(cert, null, 2)}\n`);
      written.push(path);
    } catch (e) {
      problems.push(`cannot write ${path}: ${message(e)}`);
    }
  });
  return { written, problems };
}
