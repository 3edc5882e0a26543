/**
 * What the command line needs from the outside world, passed in so that tests can
 * run commands in-process. Only `cli/` touches `process` (ARCHITECTURE.md).
 */
export interface CliIo {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
  readonly stdoutIsTerminal: boolean;
  readonly stderrIsTerminal: boolean;
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly cwd: string;
}

/** Exit statuses of CLAIMS.md. */
export const EXIT_OK = 0;
export const EXIT_FAILED = 1;
export const EXIT_USAGE = 2;
