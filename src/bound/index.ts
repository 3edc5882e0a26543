/** Bounds from types (MATH.md §6). */
export { theoremABound } from './theorem-a.js';
export { theoremBBound, type TheoremBResult } from './theorem-b.js';
