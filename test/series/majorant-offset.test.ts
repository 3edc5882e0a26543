/**
 * Majorants with one exponent per block (h = 1, every exponent offset + ℤ): a product's
 * terms then fall in one block, i + j or i + j + 1 by the carry of the offsets. Checked
 * against the exact block sums of products whose offsets carry (η^−6: 3/4, ϑ³: 3/8,
 * η^−18·ϑ: 1/4 + 1/8) and do not, and that a sum of terms with different offsets forgets it.
 */
import { describe, expect, it } from 'vitest';
import {
  type SeriesSource,
  type Majorant,
  rat,
  productSource,
  powerSource,
  sumSource,
  modularOf,
  majorantOfSeries,
} from '../../src/series/index.js';
import { thetaSource, etaPowerSource, eisensteinSource } from '../../src/forms/leaves.js';

function blockLog2(m: Majorant, j: number): number {
  const x = m.m[j - m.first] ?? 0;
  return x === 0 ? -Infinity : m.scale + Math.log2(x);
}

function expectBounds(src: SeriesSource, steps: number): Majorant {
  const X = rat(steps);
  const m = modularOf(src).majorant(X, 1);
  const exact = majorantOfSeries(src.expand(X), X, 1);
  for (let j = exact.first; j < exact.first + exact.m.length; j++) {
    expect(blockLog2(m, j), `block ${j}`).toBeGreaterThanOrEqual(blockLog2(exact, j) - 1e-9);
  }
  return m;
}

describe('majorants with offsets', () => {
  it('η^−6 · η^−6: offsets 3/4 + 3/4 carry into the next block', () => {
    const m = expectBounds(productSource([etaPowerSource(-6), etaPowerSource(-6)]), 30);
    expect(m.offset).toEqual(rat(1, 2));
  });
  it('ϑ(z)³ · η^−6 · E_4 and (ϑ(z)·η^−18)^3', () => {
    expectBounds(productSource([powerSource(thetaSource(1), 3), etaPowerSource(-6), eisensteinSource(4)]), 25);
    expectBounds(powerSource(productSource([thetaSource(1), etaPowerSource(-18)]), 3), 12);
  });
  it('a sum of terms with different offsets has none, and still bounds', () => {
    const s = sumSource([
      { source: productSource([thetaSource(1), etaPowerSource(-6)]), coefficient: rat(1) },
      { source: eisensteinSource(4), coefficient: rat(-3, 7) },
    ]);
    const m = expectBounds(s, 20);
    expect(m.offset).toBeUndefined();
  });
});
