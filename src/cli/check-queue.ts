/**
 * What `check --jobs` workers share with the thread that starts them (check-pool.ts,
 * check-worker.ts): the shared queue's layout and the messages a worker sends.
 */
import type { PathResult } from './check-path.js';
import type { ClaimFilePath } from './discover.js';
import type { CheckOptions } from '../check/index.js';

/** Index of the next file to take in the shared queue; entry k ≥ 1 is the file worker k is on (−1: none). */
export const NEXT_FILE = 0;

export type WorkerMessage = { readonly started: number } | { readonly index: number; readonly result: PathResult };

export interface WorkerSetup {
  readonly opts: CheckOptions;
  readonly paths: readonly ClaimFilePath[];
  readonly queue: Int32Array;
  readonly slot: number;
}
