/** Modular types and their inference rules (MATH.md §3). */
export * from './modular-type.js';
export * from './building-blocks.js';
export * from './divisor-rule.js';
export * from './holomorphy.js';
export * from './theta-block-order.js';
export * from './matrix.js';
export * from './holomorphy-matrix.js';
export * from './divisor-rule-multi.js';
