/**
 * `check --jobs N`: claim files are taken from one queue by this thread and N − 1
 * worker threads. The queue is an index in shared memory that every thread advances
 * atomically, so a worker takes its next file the moment it is free — never waiting for
 * this thread, which is checking files itself and reads messages only between them.
 * Workers start checking once loaded, so a small collection never waits for start-up.
 * Each worker also publishes the file it is on: once the queue is empty, this thread
 * checks a file a worker is still on as well (a worker still cold may take longer),
 * keeps whichever result comes first, stops the workers and checks any file taken but
 * left without a result. Results are put back in the order of the files.
 * With N = 1, or a single file, everything runs in this thread and the spinner can
 * name each claim.
 */
import { Worker } from 'node:worker_threads';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { checkPath, type PathResult } from './check-path.js';
import type { ClaimFilePath } from './discover.js';
import type { CheckListener, CheckOptions } from '../check/index.js';
import { type WorkerMessage, NEXT_FILE } from './check-queue.js';

export async function checkPaths(
  paths: readonly ClaimFilePath[],
  opts: CheckOptions,
  jobs: number,
  listener: CheckListener,
  fileStarted: (path: ClaimFilePath) => void = () => undefined,
): Promise<PathResult[]> {
  const workerScript = new URL('./check-worker.js', import.meta.url);
  // Run from the TypeScript sources (the tests), there is no compiled worker: stay in-process.
  const workers = existsSync(fileURLToPath(workerScript)) ? Math.min(jobs, paths.length) : 1;
  if (workers <= 1) {
    return paths.map((p) => {
      fileStarted(p);
      return checkPath(p, opts, listener);
    });
  }
  const results: (PathResult | undefined)[] = new Array<PathResult | undefined>(paths.length);
  // queue[NEXT_FILE]: the next file to take; queue[k] (k ≥ 1): the file worker k is on, or −1
  const queue = new Int32Array(new SharedArrayBuffer(4 * workers));
  queue.fill(-1, 1);
  const started = new Set<number>();
  const start = (i: number): void => {
    if (!started.has(i)) fileStarted(paths[i]!);
    started.add(i);
  };
  const pool = Array.from({ length: workers - 1 }, (_, k) => {
    const w = new Worker(workerScript, { workerData: { opts, paths, queue, slot: k + 1 } });
    w.on('message', (m: WorkerMessage) => {
      if ('started' in m) start(m.started);
      else results[m.index] ??= m.result;
    });
    w.on('error', (e) => {
      const current = Atomics.load(queue, k + 1);
      if (current >= 0 && results[current] === undefined) {
        results[current] = { ok: false, problem: `internal error in a worker: ${e.message}` };
      }
    });
    return { w, slot: k + 1 };
  });
  for (let i = Atomics.add(queue, NEXT_FILE, 1); i < paths.length; i = Atomics.add(queue, NEXT_FILE, 1)) {
    start(i);
    results[i] ??= checkPath(paths[i]!, opts, listener);
    // let the workers' messages in between files
    await new Promise<void>((r) => setImmediate(r));
  }
  for (const { w, slot } of pool) {
    await new Promise<void>((r) => setImmediate(r));
    const i = Atomics.load(queue, slot);
    if (i >= 0 && results[i] === undefined) results[i] = checkPath(paths[i]!, opts, listener);
    // the queue is empty: whatever the worker is on now, this thread has its result or checks it below
    await w.terminate();
  }
  // a file a worker took but had not yet marked, or whose result was lost with the worker
  paths.forEach((p, i) => {
    if (results[i] === undefined) {
      start(i);
      results[i] = checkPath(p, opts, listener);
    }
  });
  return results.map((r, i) => r ?? { ok: false, problem: `internal error: no result for ${paths[i]!.display}` });
}
