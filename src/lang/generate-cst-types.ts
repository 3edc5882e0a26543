/**
 * The source of `cst-types.ts`, generated from the parser's grammar so that the CST
 * converter is type-checked against the rules as they are. A test regenerates it and
 * compares (STURMCHECK_ACCEPT=1 rewrites the file).
 */
import { generateCstDts } from './chevrotain-runtime.js';
import { claimParser } from './parser.js';

const HEADER = `/**
 * Generated from the grammar in parser.ts by generate-cst-types.ts; do not edit.
 * Regenerate with STURMCHECK_ACCEPT=1 npx vitest run test/lang/generated-files.test.ts
 */
`;

export function cstTypesSource(): string {
  return HEADER + generateCstDts(claimParser.getGAstProductions()).replace(/"/g, "'");
}
