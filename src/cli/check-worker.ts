/**
 * A worker thread of `check --jobs N`: checks the claim files it is sent, one at a
 * time, and posts each file's result back with its index, so the parent can print in
 * a deterministic order whatever finishes first.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { checkPath } from './check-path.js';
import type { ClaimFilePath } from './discover.js';
import type { CheckOptions } from '../check/index.js';

interface Job {
  readonly index: number;
  readonly path: ClaimFilePath;
}

const opts = (workerData as { opts: CheckOptions }).opts;

// ask for the first file only once loaded, so the parent keeps files while workers start
parentPort?.postMessage({ ready: true });

parentPort?.on('message', (job: Job | null) => {
  if (job === null) {
    parentPort?.close();
    return;
  }
  let result;
  try {
    result = checkPath(job.path, opts, {});
  } catch (e) {
    result = { ok: false as const, problem: `internal error while checking ${job.path.display}: ${e instanceof Error ? e.message : String(e)}` };
  }
  parentPort?.postMessage({ index: job.index, result });
});
