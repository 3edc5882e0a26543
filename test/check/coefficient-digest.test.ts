/** The canonical coefficient list and its digest (grammar/certificate.schema.json, comparison.digest). */
import { describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { checkOne, checkText } from '../helpers/check.js';

function sha256(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

describe('coefficient digest', () => {
  it('is the SHA-256 of the canonical list, in compare order, both sides exact', () => {
    // phi_{-2,1} = ζ^-1 − 2 + ζ + O(q) (Eichler–Zagier, The Theory of Jacobi Forms, Theorem 9.3 and
    // the expansion after it), and so is theta(z)^2/eta^6; the bound of weight −2, index 1 is q^0
    // ((K + 2m)/12 = 0, Theorem A), so exactly three positions are compared. Order: |ℓ|, then ℓ.
    const v = checkOne('theta(z)^2 / eta^6 == phi_{-2,1}', { evidence: true });
    expect(v.verdict).toBe('proved');
    const list = '0;0;-2;-2\n0;-1;1;1\n0;1;1;1\n';
    expect(v.evidence?.coefficients).toBe(3);
    expect(v.evidence?.sha256).toBe(sha256(list));
  });

  it('lists half-integral exponents and rationals reduced, and distinguishes the sides', () => {
    // ϑ(τ, z) = Σ_n (−4/n) q^(n²/8) ζ^(n/2) (Eichler–Zagier, The Theory of Jacobi Forms, §5; the
    // convention of MATH.md §2): q^(1/8)(ζ^(1/2) − ζ^(−1/2)) + O(q^(9/8)). Bound of weight ½, index ½:
    // (K + 2m)/12 = 1/8, so the two positions of q^(1/8) are compared; ties in |ℓ| go to the lower ℓ.
    const v = checkOne('2 * theta(z) == theta(z) / 3', { evidence: true });
    expect(v.verdict).toBe('refuted');
    expect(v.evidence?.upTo).toBe('1/8');
    expect(v.evidence?.coefficients).toBe(2);
    expect(v.evidence?.sha256).toBe(sha256('1/8;-1/2;-2;-1/3\n1/8;1/2;2;1/3\n'));
  });

  it('counts exactly the coefficients the verdict reports, for every bundled proved identity', () => {
    for (const f of readdirSync('claims').filter((x) => x.endsWith('.claim'))) {
      for (const v of checkText(readFileSync(join('claims', f), 'utf8'), { evidence: true }, f)) {
        if (v.verdict === 'proved' && v.bound !== undefined) expect(v.evidence?.coefficients, `${f}: ${v.name}`).toBe(v.bound.coefficientsChecked);
      }
    }
  });

  it('is recorded only when asked for', () => {
    const v = checkOne('theta(z)^2 / eta^6 == phi_{-2,1}');
    expect(v.evidence).toBeUndefined();
    expect(v.closure).toBeUndefined();
    expect(v.bound?.parameters).toBeUndefined();
  });
});
