/**
 * The progress line of `check`: an ora spinner on stderr naming the claim being
 * checked, only when stderr is a terminal (CLAIMS.md), so that pipes and logs stay
 * clean. Claims are checked synchronously, which starves ora's timer; each new
 * claim therefore renders a frame itself. ora and its dependencies are loaded only for
 * a terminal: they take about 25 ms of start-up (string-width builds its tables when
 * loaded) that pipes, CI logs and workers never use.
 */
import type { Ora } from 'ora';
import type { CliIo } from './io.js';
import { terminalSafe } from '../report/terminal-safe.js';

export interface Progress {
  readonly claimStarted: (name: string) => void;
  readonly stop: () => void;
}

const SILENT: Progress = { claimStarted: () => undefined, stop: () => undefined };

export async function startProgress(io: CliIo, color: boolean): Promise<Progress> {
  // A terminal that reports zero columns (a bare pseudo-terminal) makes ora's line
  // count infinite and its clearing loop endless: no spinner there.
  const columns = process.stderr.columns;
  if (!io.stderrIsTerminal || !(typeof columns === 'number' && columns > 0)) return SILENT;
  const { default: ora } = await import('ora');
  // discardStdin would put stdin into raw mode and swallow Ctrl+C while a claim blocks the loop.
  const spinner: Ora = ora({ stream: process.stderr, discardStdin: false, color: color ? 'cyan' : false, isEnabled: true }).start('checking');
  return {
    claimStarted: (name) => {
      spinner.text = `checking ${terminalSafe(name)}`;
      spinner.render();
    },
    stop: () => {
      spinner.stop();
    },
  };
}
