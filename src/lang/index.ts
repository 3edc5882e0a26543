/** The public face of the front end: decoding, parsing, diagnostics. */
export type * from './ast.js';
export type { Span } from './span.js';
export type { Diagnostic, DiagnosticTemplate, Severity } from './diagnostic.js';
export { diagnostic } from './diagnostic.js';
export { codes as langDiagnostics } from './diagnostic-codes.js';
export { decodeSource, type DecodedSource } from './decode-source.js';
export { parseClaimFile, type ParsedClaimFile } from './parse-claim-file.js';
export { parseExpression, type ParsedExpression } from './parse-expression.js';
export { formatDiagnostic } from './format-diagnostic.js';
export { builtinNames } from './builtins.js';
