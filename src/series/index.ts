/** The q,ζ-series engine (exact back-end). Knows nothing of the claim language. */
export * from './integer.js';
export * from './rational.js';
export * from './slice.js';
export * from './qz-series.js';
export * from './grid.js';
export * from './add.js';
export * from './shift.js';
export * from './multiply.js';
export { mulSchoolbook } from './mul-schoolbook.js';
export { mulSparseDense, nonZeroTerms } from './mul-sparse-dense.js';
export { mulKronecker } from './mul-kronecker.js';
export { polyMulKaratsuba, polyMulSchoolbook, KARATSUBA_CUTOFF } from './karatsuba.js';
export * from './power.js';
export { powerMiller, hasMonomialLead } from './power-miller.js';
export * from './derivative.js';
export * from './substitute.js';
export * from './divide-exact.js';
export * from './series-source.js';
