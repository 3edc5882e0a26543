/** Verdict and certificate data types. */
export * from './verdict.js';
export * from './coefficient-grid.js';
export * from './certificate.js';
