/** Renderers: expansions (text, JSON) and the reports of `check` (text, JSON, JUnit XML, HTML). */
export { expansionText, expansionHeader, sliceText } from './expansion-text.js';
export { expansionJson, type ExpansionJson } from './expansion-json.js';
export { typeJson, type TypeJson } from './type-json.js';
export { expansionTerms, sliceTerms, type ExpansionTerm } from './expansion-terms.js';
export { jsonText } from './json-text.js';
export type { Reporter, ReportInput, ReportStyle } from './reporter.js';
export { REPORTERS } from './reporters.js';
export { checkJson, claimJson, type CheckJson, type ClaimJson } from './json-report.js';
export { mismatchText } from './mismatch-text.js';
export { typeDescriptionText } from './type-description-text.js';
export { junitXml, junitReporter } from './junit-report.js';
export { htmlReport, htmlReporter } from './html-report.js';
export { xmlText } from './xml-text.js';
