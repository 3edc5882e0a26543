/**
 * A small window of the coefficients two sides were compared on, for the HTML report:
 * rows are q-exponents, columns ζ-exponents (one variable) or ζ-vectors (several),
 * and every cell holds both sides' exact values and their difference. Data only; the
 * checker chooses the window (capped, so a report stays readable) and says how much
 * it left out.
 */
export interface CoefficientGrid {
  /** The q-exponent of each row, as a rational string, ascending. */
  readonly q: readonly string[];
  /** The ζ-exponent vector of each column (one entry per variable), rational strings. */
  readonly zeta: readonly (readonly string[])[];
  /** Cells indexed [row][column]: reduced rational strings. */
  readonly left: readonly (readonly string[])[];
  readonly right: readonly (readonly string[])[];
  readonly difference: readonly (readonly string[])[];
  /** The cell of the first mismatch (CLAIMS.md order), when there is one. */
  readonly firstMismatch?: { readonly row: number; readonly column: number };
  /** How many non-zero rows and distinct columns the compared region has in all. */
  readonly rowsTotal: number;
  readonly columnsTotal: number;
}
