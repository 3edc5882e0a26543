/**
 * A worker thread of `check --jobs N`: takes claim files from the shared queue
 * (check-pool.ts) until it is empty, posting each file's result back with its index,
 * so the parent can print in a deterministic order whatever finishes first.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { checkPath, type PathResult } from './check-path.js';
import { type WorkerMessage, type WorkerSetup, NEXT_FILE } from './check-queue.js';

const { opts, paths, queue, slot } = workerData as WorkerSetup;

function post(m: WorkerMessage): void {
  parentPort?.postMessage(m);
}

for (let i = Atomics.add(queue, NEXT_FILE, 1); i < paths.length; i = Atomics.add(queue, NEXT_FILE, 1)) {
  Atomics.store(queue, slot, i);
  post({ started: i });
  let result: PathResult;
  try {
    result = checkPath(paths[i]!, opts, {});
  } catch (e) {
    result = { ok: false, problem: `internal error while checking ${paths[i]!.display}: ${e instanceof Error ? e.message : String(e)}` };
  }
  post({ index: i, result });
  Atomics.store(queue, slot, -1);
}
