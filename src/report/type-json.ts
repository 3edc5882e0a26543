/**
 * A type as the JSON object of CLAIMS.md. The record itself is built in check/
 * (verdicts carry it); `expand --format json` uses the same one, under this name.
 */
import type { TypeRecord } from '../verdict/index.js';

export { typeRecord as typeJson } from '../check/type-record.js';
export type TypeJson = TypeRecord;
