/**
 * The q⁰ (and q¹) slices of the named forms, MATH.md §2 (each also confirmed by an
 * independent identity in test/published/).
 */
import { describe, expect, it } from 'vitest';
import { rat } from '../../src/series/index.js';
import { phiMinus2Source } from '../../src/forms/phi-m2-1.js';
import { phi0Source } from '../../src/forms/phi-0-1.js';
import { phiMinus1Index2Source } from '../../src/forms/phi-m1-2.js';
import { phi0Index3HalfSource } from '../../src/forms/phi-0-3half.js';
import { phi10Source } from '../../src/forms/phi-10-1.js';
import { phi12Source } from '../../src/forms/phi-12-1.js';
import { jacobiEisensteinSource } from '../../src/forms/leaves.js';
import { sliceAt } from '../helpers/series.js';

// Keys are ζ-exponents in units of ½: 2 means ζ¹, 1 means ζ^{1/2}.
describe('named forms, lowest slices', () => {
  it('φ_{−2,1} starts ζ − 2 + ζ^{−1}', () => {
    // Eichler–Zagier 1985, §9 (φ_{−2,1} = ϑ²/η⁶; MATH.md §2 table)
    expect(sliceAt(phiMinus2Source().expand(rat(2)), 0)).toEqual({ [-2]: '1', 0: '-2', 2: '1' });
  });
  it('φ_{0,1} starts ζ + 10 + ζ^{−1}, then 10ζ^{±2} − 64ζ^{±1} + 108', () => {
    const s = phi0Source().expand(rat(2));
    // Eichler–Zagier 1985, §9 (MATH.md §2 table)
    expect(sliceAt(s, 0)).toEqual({ [-2]: '1', 0: '10', 2: '1' });
    // (memory) q¹ slice; confirmed independently by Δφ_{0,1} = (E_4²E_{4,1} − E_6E_{6,1})/144 in test/published
    expect(sliceAt(s, 1)).toEqual({ [-4]: '10', [-2]: '-64', 0: '108', 2: '-64', 4: '10' });
  });
  it('φ_{−1,2} starts ζ − ζ^{−1}', () => {
    // MATH.md §2 table: ϑ(2z)/η³ = q⁰(ζ − ζ^{−1}) + …
    expect(sliceAt(phiMinus1Index2Source().expand(rat(1)), 0)).toEqual({ [-2]: '-1', 2: '1' });
  });
  it('φ_{0,3/2} starts ζ^{1/2} + ζ^{−1/2}', () => {
    // MATH.md §2 table (ϑ(2z)/ϑ(z) = ζ^{1/2} + ζ^{−1/2} + O(q))
    expect(sliceAt(phi0Index3HalfSource().expand(rat(1)), 0)).toEqual({ [-1]: '1', 1: '1' });
  });
  it('φ_{10,1} starts q(ζ − 2 + ζ^{−1}), φ_{12,1} starts q(ζ + 10 + ζ^{−1})', () => {
    // Eichler–Zagier 1985, §3 / Thm 9.3 (Δ·φ_{−2,1}, Δ·φ_{0,1})
    expect(sliceAt(phi10Source().expand(rat(2)), 1)).toEqual({ [-2]: '1', 0: '-2', 2: '1' });
    expect(sliceAt(phi12Source().expand(rat(2)), 1)).toEqual({ [-2]: '1', 0: '10', 2: '1' });
  });
  it('E_{4,1} and E_{6,1} start 1 + (ζ^{±2} + 56ζ^{±1} + 126)q and 1 + (ζ^{±2} − 88ζ^{±1} − 330)q', () => {
    // (memory) Eichler–Zagier table; confirmed by Thm 9.3 identities in test/published
    const e4 = jacobiEisensteinSource(4).expand(rat(1));
    expect(sliceAt(e4, 0)).toEqual({ 0: '1' });
    expect(sliceAt(e4, 1)).toEqual({ [-4]: '1', [-2]: '56', 0: '126', 2: '56', 4: '1' });
    const e6 = jacobiEisensteinSource(6).expand(rat(1));
    expect(sliceAt(e6, 1)).toEqual({ [-4]: '1', [-2]: '-88', 0: '-330', 2: '-88', 4: '1' });
  });
});
