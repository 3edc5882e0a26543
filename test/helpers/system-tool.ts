/**
 * ARCHITECTURE.md: a test that needs a system tool skips with a message when the tool
 * is missing and CI is unset, and fails when CI=true (`.ci/run` installs it first).
 */
import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';

export interface SystemTool {
  /** Where the tool is, or null when it is missing. */
  readonly path: string | null;
  /** Whether the tests that need it run (they must when CI=true). */
  readonly run: boolean;
}

function locate(name: string): string | null {
  if (name.startsWith('/')) return existsSync(name) ? name : null;
  const r = spawnSync('sh', ['-c', `command -v ${name}`], { encoding: 'utf8' });
  const found = r.stdout.trim();
  return r.status === 0 && found !== '' ? found : null;
}

export function systemTool(name: string, aptPackage: string): SystemTool {
  const path = locate(name);
  const ci = process.env['CI'] === 'true';
  if (path === null && !ci) {
    console.warn(`skipping the tests that need ${name}: it is missing (apt-get install -y ${aptPackage}); CI=true makes them fail instead`);
  }
  // In CI a missing tool must fail, so the tests run and fail on it.
  return { path, run: path !== null || ci };
}
