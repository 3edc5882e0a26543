/**
 * The evaluator's catalogue of diagnostics (codes SC-E…), same shape as the front
 * end's (`lang/diagnostic-codes.ts`). Codes are stable.
 */
import type { DiagnosticTemplate } from '../lang/diagnostic.js';

function error(code: string, template: string): DiagnosticTemplate {
  return { code, severity: 'error', template };
}

export const evalCodes = {
  divisionByZero: error('SC-E001', 'division by zero: {what} is identically zero'),
  divisorNotShownNonZero: error(
    'SC-E002',
    'cannot show that the divisor {what} is non-zero: its coefficients vanish as far as they were computed (q^{order})',
  ),
  illTypedSum: error('SC-E003', 'the terms of this sum have different types: {left} has {leftType}, {right} has {rightType} ({differences})'),
  notYetSupported: error('SC-E004', '{what} is not supported yet'),
  tooManyTerms: error(
    'SC-E005',
    'the expansion would need about {estimate} coefficients, more than --max-terms {limit}; ask for a lower q-order or raise --max-terms',
  ),
  exponentTooLarge: error('SC-E006', 'the exponent {exponent} is too large'),
  zeroToNegativePower: error('SC-E007', 'zero raised to a negative power'),
  meromorphicInput: error('SC-E008', '{what} of a meromorphic expression is not supported yet (its denominator is {denominator})'),
  poleFound: error('SC-E009', '{what} has a pole: {detail}'),
  failedDefinition: error('SC-E010', "'{name}' could not be evaluated: {reason}"),
  assumeNotQuasi: error('SC-E011', "assume {name}: '{name}' has a proven type already (class {cls}); assume is only for quasi-modular definitions"),
  assumeTypeMismatch: error('SC-E012', 'assume {name}: the rules give {inferred}, not {declared} ({differences})'),
  inconsistentType: error('SC-E013', 'the type {type} is not consistent: 2k ≡ D (mod 2) fails'),
  assumeMeromorphic: error('SC-E014', "assume {name}: the definition has the divisor {denominator}; assume needs a holomorphic one"),
  duplicateClaim: error('SC-E015', "a claim named '{name}' already exists in this file (line {line})"),
  operatorPrecondition: error('SC-E016', '{op} needs {condition}; its input has {type}'),
  oneVariableOnly: error('SC-E017', '{what} needs one variable; this file has {variables}: substitute a linear form, e.g. phi_{0,1}(z1)'),
  wrongArity: error('SC-E018', 'the substitution needs {expected} linear form(s), found {found}'),
  badLattice: error('SC-E019', "lattice {name}: {reason}"),
  noBound: error('SC-E020', 'no bound for index {index}: {detail}'),
  indexSize: error('SC-E021', 'the index has size {size}, but the expression has {nvars} variable(s)'),
  internal: error('SC-E999', 'internal error: {detail}; please report it with the claim text'),
} as const;
