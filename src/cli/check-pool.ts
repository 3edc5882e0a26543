/**
 * `check --jobs N`: claim files are handed to N worker threads from one queue (a
 * worker takes the next file when it is done, so long files do not hold up short
 * ones); results are put back in the order of the files. With N = 1, or a single
 * file, everything runs in this thread and the spinner can name each claim.
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
  const runWorker = (): Promise<void> =>
    new Promise((resolve) => {
      const w = new Worker(workerScript, { workerData: { opts } });
      let current = -1;
      const feed = (): void => {
        if (next >= paths.length) {
          w.postMessage(null);
          return;
        }
        current = next++;
        fileStarted(paths[current]!);
        w.postMessage({ index: current, path: paths[current] });
      };
      w.on('message', (m: { index: number; result: PathResult }) => {
        results[m.index] = m.result;
        feed();
      });
      w.on('error', (e) => {
        if (current >= 0 && results[current] === undefined) {
          results[current] = { ok: false, problem: `internal error in a worker: ${e.message}` };
        }
      });
      w.on('exit', () => resolve());
      feed();
    });
  await Promise.all(Array.from({ length: workers }, runWorker));
  return results.map((r, i) => r ?? { ok: false, problem: `internal error: no result for ${paths[i]!.display}` });
}
