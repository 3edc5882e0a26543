#!/usr/bin/env node
/** The executable: wires process streams into runCli and sets the exit status. */
import { runCli } from './run-cli.js';

const code = await runCli(process.argv.slice(2), {
  stdout: (t) => process.stdout.write(t),
  stderr: (t) => process.stderr.write(t),
  stdoutIsTerminal: process.stdout.isTTY === true,
  stderrIsTerminal: process.stderr.isTTY === true,
  env: process.env,
  cwd: process.cwd(),
});
process.exitCode = code;
