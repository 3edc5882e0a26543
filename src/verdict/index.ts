/** Verdict and certificate data types. */
export * from './verdict.js';
