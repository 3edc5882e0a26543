/** Runs the command line in-process and captures its output. */
import { runCli } from '../../src/cli/run-cli.js';

export interface CliRun {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

export async function cli(...argv: string[]): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await runCli(argv, {
    stdout: (t) => (stdout += t),
    stderr: (t) => (stderr += t),
    stdoutIsTerminal: false,
    stderrIsTerminal: false,
    env: {},
    cwd: process.cwd(),
  });
  return { code, stdout, stderr };
}
