/**
 * What every output format of `check` implements: the verdicts of a run → one text.
 * Reporters are pure: the command line decides where the text goes and whether the
 * destination can show colour.
 */
import type { Verdict } from '../verdict/index.js';

export interface ReportInput {
  /** Every verdict of the run, files in the order checked, claims in file order. */
  readonly verdicts: readonly Verdict[];
  /** The decoded text of each checked file, keyed by `Verdict.file`, for quoting diagnostics. */
  readonly sources: ReadonlyMap<string, string>;
  readonly toolVersion: string;
}

export interface ReportStyle {
  /** ANSI colour; the caller has already honoured `--no-color`, `NO_COLOR` and terminal detection. */
  readonly color: boolean;
  /** `--verbose`: types, the compared sides and the bound's derivation. */
  readonly verbose: boolean;
}

export interface Reporter {
  readonly render: (input: ReportInput, style: ReportStyle) => string;
}
