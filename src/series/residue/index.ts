/** The modular back-end: residue series, majorants, prime choice, reconstruction. */
export * from './majorant.js';
export * from './residue-series.js';
export * from './residue-multiply.js';
export * from './residue-power.js';
export * from './residue-inverse.js';
export * from './miller-four-primes.js';
export * from './shared-integers.js';
export * from './residue-combine.js';
export * from './residue-align.js';
export * from './series-of-residues.js';
export * from './modular-view.js';
export * from './prime-choice.js';
export { garner } from '../modular/garner.js';
export { nttPrimes, type NttPrime } from '../modular/ntt-primes.js';
export { mulmod, powmod, invmod } from '../modular/mulmod.js';
