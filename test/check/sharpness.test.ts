/**
 * Sharpness of Theorem A (MATH.md §6, issue: soundness). Δ^j·φ_{−2,1}^m has weight
 * 12j − 2m and index m, so (K + 2m)/12 = j, and it first differs from 0 exactly at q^j
 * (Δ^j starts at q^j, φ_{−2,1}^m at q⁰ with slice (ζ − 2 + ζ^{−1})^m). A bound one step
 * lower would wrongly prove `Δ^j φ_{−2,1}^m == 0`.
 */
import { describe, expect, it } from 'vitest';
import { rat, rsub } from '../../src/series/index.js';
import type { ModularType } from '../../src/types/index.js';
import { checkOne } from '../helpers/check.js';

const CASES: [number, number][] = [
  [1, 0],
  [1, 1],
  [2, 1],
  [1, 3],
  [2, 2],
  [3, 1],
  [1, 5],
];

describe('Theorem A is sharp on Δ^j φ_{−2,1}^m', () => {
  it.each(CASES)('Δ^%i·φ_{−2,1}^%i == 0 is refuted exactly at q^j', (j, m) => {
    const v = checkOne(`Delta^${j} * phi_{-2,1}^${m} == 0`);
    expect(v.verdict).toBe('refuted');
    expect(v.mismatch?.q).toBe(String(j));
    // the value is the ζ^ℓ coefficient of (ζ − 2 + ζ^{−1})^m = (ζ^{1/2} − ζ^{−1/2})^{2m}, i.e.
    // (−1)^{m−ℓ} C(2m, m−ℓ); the first mismatch is at ℓ = 0, where it is never zero
    const l = Number(v.mismatch!.zeta[0]);
    const binom = (n: number, k: number): number => (k < 0 || k > n ? 0 : k === 0 ? 1 : (binom(n, k - 1) * (n - k + 1)) / k);
    expect(Number(v.mismatch!.left)).toBe((m - l) % 2 === 0 ? binom(2 * m, m - l) : -binom(2 * m, m - l));
    expect(Math.abs(l)).toBe(0);
  });

  it.each(CASES)('with the weight lowered by 12 (a wrong type rule) Δ^%i·φ_{−2,1}^%i == 0 is caught by the margin', (j, m) => {
    const lower = (t: ModularType): ModularType => ({ ...t, weight: rsub(t.weight, rat(12)) });
    const v = checkOne(`Delta^${j} * phi_{-2,1}^${m} == 0`, { adjustTypeForTest: lower });
    // the lowered bound j − 1 compares nothing that differs; the margin (two more q-steps) does
    expect(v.verdict).toBe('error');
    expect(v.reason).toMatch(/^internal error: the sides agree inside the bound but differ/);
  });

  it('the bound is reported with its derivation', () => {
    const v = checkOne('Delta * phi_{-2,1} == phi_{10,1}');
    expect(v.verdict).toBe('proved');
    expect(v.bound).toMatchObject({ theorem: 'A', qOrder: '1' });
    expect(v.bound!.derivation).toContain('K = 10, m = 1');
  });
});
