/**
 * `sturmcheck [check] PATH…` (CLAIMS.md): discover the claim files, check every
 * claim in order, render the report in the chosen format to stdout or `--output`,
 * write the HTML report (`--report`) and the certificates (`--certificates`) when
 * asked, and decide the exit status: 2 when the command could not do all it was
 * asked (it wins), else 1 when a claim missed its expected verdict, else 0.
 */
import { resolve } from 'node:path';
import { availableParallelism } from 'node:os';
import { DEFAULT_CHECK_OPTIONS, type CheckOptions } from '../../check/index.js';
import { summarize, type Verdict } from '../../verdict/index.js';
import { REPORTERS, htmlReporter, type Reporter, type ReportInput } from '../../report/index.js';
import type { ParsedArgs } from '../parse-args.js';
import { type CliIo, EXIT_FAILED, EXIT_OK, EXIT_USAGE } from '../io.js';
import { DEFAULT_DEPTH, DEFAULT_MAX_TERMS } from '../options.js';
import { toolVersion } from '../version.js';
import { discoverClaimFiles } from '../discover.js';
import { checkPaths } from '../check-pool.js';
import { startProgress } from '../spinner.js';
import { wantsColor } from '../color.js';
import { writeFileAtomic } from '../atomic-write.js';
import { writeCertificates } from '../write-certificates.js';

function usageError(io: CliIo, message: string): number {
  io.stderr(`sturmcheck: ${message}\n(see sturmcheck check --help)\n`);
  return EXIT_USAGE;
}

function checkOptions(args: ParsedArgs): CheckOptions {
  const num = (name: string, fallback: number): number => {
    const v = args.options.get(name);
    return typeof v === 'number' ? v : fallback;
  };
  // Certificates and the HTML report need the compared coefficients; a plain run skips that work.
  const evidence = typeof args.options.get('certificates') === 'string' || typeof args.options.get('report') === 'string';
  return { ...DEFAULT_CHECK_OPTIONS, maxTerms: num('max-terms', DEFAULT_MAX_TERMS), depth: num('depth', DEFAULT_DEPTH), evidence };
}

/** The reporter for `--format`, or the reason there is none. */
function chooseReporter(args: ParsedArgs): Reporter | string {
  const format = args.options.get('format');
  const name = typeof format === 'string' ? format : 'text';
  return REPORTERS.get(name) ?? `--format ${name} is not available in this version yet`;
}

interface Run {
  readonly verdicts: Verdict[];
  readonly sources: Map<string, string>;
  readonly problems: string[];
}

/** `--jobs N`, by default the number of cores. */
function jobsOption(args: ParsedArgs): number {
  const v = args.options.get('jobs');
  return typeof v === 'number' ? v : availableParallelism();
}

async function checkAll(args: ParsedArgs, io: CliIo, color: boolean): Promise<Run> {
  const discovery = discoverClaimFiles(args.positionals, io.cwd);
  const run: Run = { verdicts: [], sources: new Map(), problems: [...discovery.problems] };
  const progress = await startProgress(io, color);
  try {
    const opts = checkOptions(args);
    const results = await checkPaths(discovery.files, opts, jobsOption(args), { claimStarted: progress.claimStarted }, (file) =>
      progress.claimStarted(file.display),
    );
    results.forEach((result, i) => {
      if (!result.ok) {
        run.problems.push(result.problem);
        return;
      }
      run.verdicts.push(...result.verdicts);
      run.sources.set(discovery.files[i]!.display, result.text);
    });
  } finally {
    progress.stop();
  }
  return run;
}

/** Writes a file atomically; false (after saying why) when it cannot be written. */
function writeOutput(io: CliIo, path: string, text: string): boolean {
  try {
    writeFileAtomic(resolve(io.cwd, path), text);
    return true;
  } catch (e) {
    io.stderr(`sturmcheck: cannot write ${path}: ${e instanceof Error ? e.message : String(e)}\n`);
    return false;
  }
}

/** Writes the report to stdout or `--output`; false when the output file cannot be written. */
function deliver(args: ParsedArgs, io: CliIo, text: string): boolean {
  const output = args.options.get('output');
  if (typeof output !== 'string') {
    io.stdout(text);
    return true;
  }
  return writeOutput(io, output, text);
}

/** `--report FILE.html` and `--certificates DIR`; false when something could not be written. */
function writeExtras(args: ParsedArgs, io: CliIo, input: ReportInput): boolean {
  let ok = true;
  const report = args.options.get('report');
  if (typeof report === 'string') ok = writeOutput(io, report, htmlReporter.render(input, { color: false, verbose: true })) && ok;
  const dir = args.options.get('certificates');
  if (typeof dir === 'string') {
    const result = writeCertificates(resolve(io.cwd, dir), input.verdicts, input.toolVersion);
    for (const p of result.problems) io.stderr(`sturmcheck: ${p}\n`);
    ok = result.problems.length === 0 && ok;
  }
  return ok;
}

export async function runCheck(args: ParsedArgs, io: CliIo): Promise<number> {
  const reporter = chooseReporter(args);
  if (typeof reporter === 'string') return usageError(io, reporter);
  if (args.positionals.length === 0) return usageError(io, 'check needs at least one PATH (a .claim file or a folder)');
  const toFile = typeof args.options.get('output') === 'string';
  const stdoutColor = wantsColor(args, io, !toFile && io.stdoutIsTerminal);
  const run = await checkAll(args, io, wantsColor(args, io, io.stderrIsTerminal));
  for (const p of run.problems) io.stderr(`sturmcheck: ${p}\n`);
  const style = { color: stdoutColor, verbose: args.options.get('verbose') === true };
  const input: ReportInput = { verdicts: run.verdicts, sources: run.sources, toolVersion: toolVersion() };
  const written = deliver(args, io, reporter.render(input, style));
  const extras = writeExtras(args, io, input);
  if (run.problems.length > 0 || !written || !extras) return EXIT_USAGE;
  return summarize(run.verdicts).asExpected ? EXIT_OK : EXIT_FAILED;
}
