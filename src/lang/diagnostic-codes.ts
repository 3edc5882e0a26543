/**
 * The front end's catalogue of diagnostics. Codes are stable: a code never changes
 * meaning; retired codes are not reused. L = lexical and decoding, P = syntax,
 * N = names and classification, I = internal faults.
 */
import type { DiagnosticTemplate } from './diagnostic.js';

function error(code: string, template: string): DiagnosticTemplate {
  return { code, severity: 'error', template };
}

export const codes = {
  // Lexical and decoding.
  unexpectedCharacter: error('SC-L001', "unexpected character '{character}'"),
  unterminatedString: error('SC-L002', 'unterminated string: a string ends with " on the same line'),
  badStringEscape: error('SC-L003', 'invalid string: {reason} (strings use JSON escapes)'),
  unbracedSubscript: error('SC-L004', 'a subscript of more than one character needs braces: write {suggestion}'),
  loneUnderscore: error('SC-L005', "'_' must be followed by one letter or digit, or by a braced subscript such as _{-2,1}"),
  malformedSubscript: error('SC-L006', "malformed subscript in '{name}': {reason}"),
  decimalNumber: error('SC-L007', "decimal numbers are not allowed: write '{text}' as a fraction, e.g. {suggestion}"),
  notUtf8: error('SC-L010', 'the file is not UTF-8 text: invalid byte 0x{byte} at offset {offset}'),
  binaryContent: error('SC-L011', 'the file looks binary: it contains a NUL byte at offset {offset}'),
  utf16: error('SC-L012', 'the file is UTF-16 text; save it as UTF-8'),

  // Syntax.
  unexpectedToken: error('SC-P001', 'expected {expected}, found {found}'),
  extraInput: error('SC-P002', 'expected the end of the statement, found {found}'),
  unclosedBracket: error('SC-P003', "expected '{closer}' to close '{opener}' opened at {position}"),
  emptyExpression: error('SC-P004', 'empty expression'),
  nonIntegerExponent: error('SC-P005', 'the exponent of ^ must be an integer, not {found}'),
  exponentTooLarge: error('SC-P006', 'the exponent is too large to evaluate'),
  zeroDenominator: error('SC-P007', "division by zero in the number '{text}'"),
  characterNotEta: error('SC-P008', "a character is written eta^D, found '{found}'"),
  matrixShape: error('SC-P009', 'the matrix must be square and symmetric: {reason}'),

  // Names and classification.
  unknownName: error('SC-N001', "unknown name '{name}'"),
  usedBeforeDefinition: error('SC-N002', "'{name}' is used before its definition at line {line}"),
  redefinition: error('SC-N003', "'{name}' is already defined at line {line}"),
  builtinRedefinition: error('SC-N004', "'{name}' is a built-in name and cannot be defined"),
  implicitMultiplication: error('SC-N005', 'implicit multiplication: write {coefficient}*{name}'),
  variableAsExpression: error(
    'SC-N006',
    "the variable '{name}' can only appear in a linear form (the argument of theta, wp, Theta[…] or a substitution)",
  ),
  callOnExpression: error('SC-N007', 'only a name can take arguments: name it with let, then call the name'),
  badEisensteinWeight: error('SC-N008', "'{name}': E_k needs an even weight k ≥ 2"),
  badJacobiEisenstein: error('SC-N009', "'{name}': E_{k,1} needs an even weight k ≥ 4 and index 1"),
  notLevelOne: error('SC-N010', "only {name}(tau) is level one: write {name}"),
  missingArguments: error('SC-N011', "'{name}' needs arguments: write {example}"),
  wrongArgumentCount: error('SC-N012', "'{name}' takes {expected}, found {found}"),
  notLinearForm: error('SC-N013', 'expected a linear form in {variables}: {reason}'),
  unknownLattice: error('SC-N014', "unknown lattice '{name}'"),
  badOperatorLevel: error('SC-N015', "'{name}' needs a positive integer subscript, as in {example}"),
  badTaylorOrder: error('SC-N016', 'the order of taylor(f, ν) must be a non-negative integer literal'),
  badBracketOrder: error('SC-N017', 'the order n of [f, g]_n must be a non-negative integer, found {found}'),
  lateVariables: error('SC-N018', "'variables' must come before the first let, assume or claim"),
  duplicateName: error('SC-N019', "'{name}' appears twice in this list"),
  variablesTwice: error('SC-N020', "the variables are already declared at line {line}"),
  clashWithVariable: error('SC-N021', "'{name}' is a variable of the file and cannot be {use}"),
  misplacedTau: error('SC-N022', "'tau' can only appear as eta(tau)"),
  brokenDefinition: error('SC-N023', "'{name}' cannot be used: its definition at line {line} has errors"),
  parametersNeeded: error('SC-N024', "'{name}' has parameters ({parameters}): write {example}"),
  notAFunction: error('SC-N025', "'{name}' is a variable, not something that takes arguments"),
  noSubstitution: error('SC-N026', "'{name}' has no elliptic variable to substitute: write {name} or {name}(0)"),
  assumeNeedsLet: error('SC-N027', "'{name}' is not defined with let; assume applies to let names"),

  // Faults of the program itself, never of the input.
  internalError: error('SC-I001', 'internal error in the front end ({detail}); please report it with the claim text'),
} as const satisfies Record<string, DiagnosticTemplate>;

export type DiagnosticKey = keyof typeof codes;
