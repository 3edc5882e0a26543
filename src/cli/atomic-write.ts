/**
 * Output files are written to a temporary name in the same folder and renamed
 * (ARCHITECTURE.md): a reader never sees half a report, and a failed run leaves
 * the previous file intact. Same folder, because a rename across file systems is
 * not atomic.
 */
import { renameSync, rmSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { randomBytes } from 'node:crypto';

export function writeFileAtomic(path: string, content: string): void {
  const temp = join(dirname(path), `.${basename(path)}.${randomBytes(6).toString('hex')}.tmp`);
  try {
    writeFileSync(temp, content, { flag: 'wx' });
    renameSync(temp, path);
  } catch (e) {
    rmSync(temp, { force: true });
    throw e;
  }
}
