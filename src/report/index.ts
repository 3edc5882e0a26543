/** Renderers (text, JSON; later JUnit XML and HTML). */
export { expansionText, expansionHeader, sliceText } from './expansion-text.js';
export { expansionJson, type ExpansionJson } from './expansion-json.js';
export { typeJson, type TypeJson } from './type-json.js';
export { expansionTerms, sliceTerms, type ExpansionTerm } from './expansion-terms.js';
export { jsonText } from './json-text.js';
