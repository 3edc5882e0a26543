/** What names mean at a point of a claim file, as resolution walks it top to bottom. */

export interface LetEntry {
  /** Null for a parameterless let, which takes the file's variables in order. */
  readonly params: readonly string[] | null;
  readonly line: number;
}

export interface LatticeEntry {
  readonly rank: number;
  readonly line: number;
}

export interface Scope {
  /** Variables visible here: the file's, or a `let`'s parameters inside its body. */
  readonly variables: readonly string[];
  readonly fileVariables: readonly string[];
  readonly lets: ReadonlyMap<string, LetEntry>;
  /** Lets whose definitions have errors: uses are reported once, not as unknown. */
  readonly brokenLets: ReadonlyMap<string, number>;
  /** Every let of the file with its line, to tell "defined later" from "unknown". */
  readonly allLets: ReadonlyMap<string, number>;
  readonly lattices: ReadonlyMap<string, LatticeEntry>;
}
