/**
 * The whole bundled claims/ collection as a benchmark: wall time of the command
 * `check claims --jobs N` (spawned afresh each time, so module loading and worker
 * start-up count), best and median of five runs. It has no checksum.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const CLI = fileURLToPath(new URL('../dist/cli/main.js', import.meta.url));
const ROOT = fileURLToPath(new URL('..', import.meta.url));

export const COLLECTIONS = [
  { name: 'claims-j1', title: 'the bundled claims/ collection, `check claims --jobs 1` (wall time)', jobs: 1 },
  { name: 'claims-j2', title: 'the bundled claims/ collection, `check claims --jobs 2` (wall time)', jobs: 2 },
];

export function runCollectionOnce(c) {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, [CLI, 'check', 'claims', '--jobs', String(c.jobs)], { cwd: ROOT, encoding: 'utf8', maxBuffer: 1 << 24 });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`${c.name}: check claims exited ${r.status ?? r.signal}:\n${r.stdout.slice(-2000)}${r.stderr}`);
  return ms;
}
