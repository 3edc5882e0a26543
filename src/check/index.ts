/** Evaluation, expansion and (later) checking of claims. */
export { newEvalContext, evaluate, evaluateLet, type EvalContext } from './evaluate.js';
export { expandMonomial, type Expansion, DEFAULT_STEPS_PAST_LEADING } from './expand.js';
export { EvalError, evalError } from './eval-error.js';
export { evalCodes } from './diagnostic-codes.js';
export type { Atom, Monomial, AtomPower } from './atom.js';
