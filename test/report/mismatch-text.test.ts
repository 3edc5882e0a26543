/** The first mismatch as text, exponents as `expand` writes them. */
import { describe, expect, it } from 'vitest';
import { mismatchText } from '../../src/report/index.js';

describe('mismatch text', () => {
  it('integral exponents', () => {
    expect(mismatchText({ q: '1', zeta: ['0'], left: '-2', right: '-288/143' })).toBe('at q^1 ζ^0: left -2, right -288/143');
  });

  it('fractional and negative exponents are parenthesised', () => {
    expect(mismatchText({ q: '1/4', zeta: ['-1/2'], left: '1', right: '0' })).toBe('at q^(1/4) ζ^(-1/2): left 1, right 0');
  });

  it('several variables are numbered', () => {
    expect(mismatchText({ q: '2', zeta: ['1', '-1'], left: '3', right: '4' })).toBe('at q^2 ζ1^1 ζ2^(-1): left 3, right 4');
  });
});
