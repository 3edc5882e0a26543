/**
 * `check --jobs N`: claim files are taken from one queue by this thread and N − 1
 * worker threads (each takes the next file when it is done, so long files do not hold
 * up short ones; a worker asks for its first file once it has loaded, so this thread
 * checks files meanwhile and a small collection never waits for start-up); results are
 * put back in the order of the files. With N = 1, or a single file, everything runs in
 * this thread and the spinner can name each claim.
 */
import { Worker } from 'node:worker_threads';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { checkPath, type PathResult } from './check-path.js';
import type { ClaimFilePath } from './discover.js';
import type { CheckListener, CheckOptions } from '../check/index.js';

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
  let next = 0;
  const inFlight = new Map<Worker, number>();
  const runWorker = (): Promise<void> =>
    new Promise((resolve) => {
      const w = new Worker(workerScript, { workerData: { opts } });
      const feed = (): void => {
        inFlight.delete(w);
        if (next >= paths.length) {
          w.postMessage(null);
          return;
        }
        const current = next++;
        inFlight.set(w, current);
        fileStarted(paths[current]!);
        w.postMessage({ index: current, path: paths[current] });
      };
      w.on('message', (m: { ready: true } | { index: number; result: PathResult }) => {
        if ('index' in m) results[m.index] ??= m.result;
        feed();
      });
      w.on('error', (e) => {
        const current = inFlight.get(w);
        if (current !== undefined && results[current] === undefined) {
          results[current] = { ok: false, problem: `internal error in a worker: ${e.message}` };
        }
      });
      w.on('exit', () => {
        inFlight.delete(w);
        resolve();
      });
    });
  const running = Array.from({ length: workers - 1 }, runWorker);
  while (next < paths.length) {
    const i = next++;
    fileStarted(paths[i]!);
    results[i] = checkPath(paths[i]!, opts, listener);
    // let the workers' messages in between files
    await new Promise<void>((r) => setImmediate(r));
  }
  // the queue is empty: rather than wait for a worker (maybe still cold) on its last
  // file, check that file here too and keep whichever result comes first
  for (const [w, i] of [...inFlight].reverse()) {
    if (results[i] === undefined) results[i] = checkPath(paths[i]!, opts, listener);
    await w.terminate();
    await new Promise<void>((r) => setImmediate(r));
  }
  await Promise.all(running);
  return results.map((r, i) => r ?? { ok: false, problem: `internal error: no result for ${paths[i]!.display}` });
}
