/**
 * The bound a function of a given type needs (MATH.md §6): Theorem A for one variable,
 * Theorem B (with the kernel of the index split off) for several. An index that is not
 * positive semi-definite, or whose double is not integral, has no bound here: an error.
 */
import { type Rational, rat, rcmp, rmax, rationalToString } from '../series/index.js';
import { type ModularType, scalarIndexOf, formatIndex } from '../types/index.js';
import { theoremABound, theoremBBound } from '../bound/index.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

export interface TypeBound {
  readonly theorem: 'A' | 'B';
  /** Compare every coefficient with q-exponent ≤ qOrder. */
  readonly qOrder: Rational;
  readonly derivation: string;
}

export function boundFor(t: ModularType): TypeBound {
  if (t.index.length === 1) {
    const m = scalarIndexOf(t);
    // A negative index only enlarges nothing: the proof needs m ≥ 0, so use max(m, 0).
    const X = theoremABound(t.weight, rmax(m, rat(0)));
    const mText = rcmp(m, rat(0)) < 0 ? `max(${formatIndex(t.index)}, 0)` : formatIndex(t.index);
    return {
      theorem: 'A',
      qOrder: X,
      derivation: `(K + 2m)/12 with K = ${rationalToString(t.weight)}, m = ${mText}: q-order ${rationalToString(X)} (Theorem A)`,
    };
  }
  try {
    const b = theoremBBound(t.weight, t.index);
    return { theorem: b.theorem, qOrder: b.qOrder, derivation: b.derivation };
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    throw evalError(evalCodes.noBound, { index: formatIndex(t.index), detail }, null);
  }
}
