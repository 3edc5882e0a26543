/** Evaluation, expansion and checking of claims. */
export { newEvalContext, evaluate, evaluateLetBody, type EvalContext } from './evaluate.js';
export { expandMonomial, type Expansion, DEFAULT_STEPS_PAST_LEADING } from './expand.js';
export { EvalError, evalError } from './eval-error.js';
export { evalCodes } from './diagnostic-codes.js';
export type { Atom, Monomial, AtomPower } from './atom.js';
export { checkClaimFile, type CheckListener } from './check-file.js';
export { type CheckOptions, DEFAULT_CHECK_OPTIONS } from './check-options.js';
export { typeRecord } from './type-record.js';
export { describeType, type TypeDescription } from './describe-type.js';
export { boundOfType } from './side-zero.js';
export { boundFor, type TypeBound } from './bound-of-type.js';
export { compareTo, defaultZetaNorm, type ZetaNorm, type Mismatch } from './compare-series.js';
