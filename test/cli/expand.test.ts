/** `sturmcheck expand` end to end (in-process): values, formats, and bad input. */
import { describe, expect, it } from 'vitest';
import { cli } from '../helpers/cli.js';
import { readOeis } from '../helpers/oeis.js';

interface TermJson {
  q: string;
  zeta: string[];
  c: string;
}

describe('expand', () => {
  it("phi_{0,1} to q^3: the table of slices (Eichler–Zagier 1985, §9; MATH.md §2)", async () => {
    const r = await cli('expand', 'phi_{0,1}', '--to', '3');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('type        weight 0, index 1, multiplier trivial');
    expect(r.stdout).toContain('q^0  ζ^(-1) + 10 + ζ\n');
    // (memory) q¹ slice of MATH.md §2, confirmed by Thm 9.3 in test/published/jacobi-identities
    expect(r.stdout).toContain('q^1  10ζ^(-2) - 64ζ^(-1) + 108 - 64ζ + 10ζ^2\n');
  });

  it('Delta as JSON reproduces Ramanujan τ (OEIS A000594)', async () => {
    const seq = readOeis('A000594');
    const r = await cli('expand', 'Delta', '--to', String(seq.terms.length), '--format', 'json');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { type: Record<string, string>; qOrder: string; terms: TermJson[] };
    expect(out.type).toEqual({ weight: '12', index: '0', multiplier: 'trivial', class: 'modular' });
    expect(out.terms.map((t) => t.c)).toEqual(seq.terms.filter((t) => t !== '0'));
    expect(out.terms[0]).toEqual({ q: '1', zeta: ['0'], c: '1' });
  });

  it('theta(z) with half-integral exponents and the default q-order (leading + 5)', async () => {
    const r = await cli('expand', 'ϑ(z)', '--format', 'json');
    const out = JSON.parse(r.stdout) as { qOrder: string; type: Record<string, string>; terms: TermJson[] };
    expect(out.qOrder).toBe('41/8');
    expect(out.type.multiplier).toBe('eta^3');
    // MATH.md §2: ϑ = Σ χ₋₄(n) q^{n²/8} ζ^{n/2}; terms sorted by q, then |ℓ|, then ℓ
    expect(out.terms.slice(0, 4)).toEqual([
      { q: '1/8', zeta: ['-1/2'], c: '-1' },
      { q: '1/8', zeta: ['1/2'], c: '1' },
      { q: '9/8', zeta: ['-3/2'], c: '1' },
      { q: '9/8', zeta: ['3/2'], c: '-1' },
    ]);
  });

  it('a meromorphic expression shows its numerator and names its denominator', async () => {
    const r = await cli('expand', 'wp(z)', '--to', '1/4', '--format', 'json');
    const out = JSON.parse(r.stdout) as { denominator: string; type: Record<string, string>; terms: TermJson[] };
    expect(out.denominator).toBe('theta(z)^2');
    expect(out.type.class).toBe('meromorphic');
    // N = ℘̃ϑ² starts q^{1/4}(ζ/12 + 5/6 + ζ^{-1}/12): from ℘̃ = 1/12 + ζ/(1−ζ)² + O(q) (MATH.md §2)
    expect(out.terms).toEqual([
      { q: '1/4', zeta: ['0'], c: '5/6' },
      { q: '1/4', zeta: ['-1'], c: '1/12' },
      { q: '1/4', zeta: ['1'], c: '1/12' },
    ]);
  });

  it('a theta quotient holomorphic by the divisor rule is expanded, not cross-multiplied', async () => {
    const r = await cli('expand', 'theta(2z)/theta(z)', '--to', '1', '--format', 'json');
    const out = JSON.parse(r.stdout) as { denominator?: string; type: Record<string, string>; terms: TermJson[] };
    expect(out.denominator).toBeUndefined();
    expect(out.type).toEqual({ weight: '0', index: '3/2', multiplier: 'trivial', class: 'modular' });
    expect(out.terms.slice(0, 2).map((t) => t.c)).toEqual(['1', '1']); // ζ^{±1/2}, MATH.md §2 φ_{0,3/2}
  });

  it('E_4^3 - E_6^2 = 1728 Delta (common practice, no source needed: MATH.md §2 via OEIS A000594)', async () => {
    const r = await cli('expand', 'E_4^3 - E_6^2 - 1728*Delta', '--to', '30');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('0  (every coefficient up to q^30 vanishes)');
  });
});

describe('expand: bad input gets a clear error and exit status', () => {
  it.each([
    ['phi_{0,2}', 'SC-N001', "did you mean 'phi_{0,1}'"],
    ['2E_4', 'SC-N005', 'implicit multiplication: write 2*E_4'],
    ['1/0', 'SC-E001', 'division by zero'],
    ['1/theta(0)', 'SC-E001', 'division by zero'],
    ['1/theta(z - z)', 'SC-E001', 'division by zero'],
    ['1/phi_{-2,1}(0)', 'SC-E001', 'identically zero'],
    ['E_4 + E_6', 'SC-E003', 'weight 4 vs 6'],
    ['E_10', 'SC-L004', 'E_{10}'],
    ['theta(z', 'SC-P003', "expected ')' to close"],
    ['', 'SC-P004', 'empty expression'],
  ])('%s → %s', async (expr, code, text) => {
    const r = await cli('expand', expr);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain(code);
    expect(r.stderr).toContain(text);
    expect(r.stderr).not.toMatch(/at .*\.(ts|js):\d+/); // no stack trace
  });

  it('refuses an expansion past --max-terms before allocating, stating the estimate', async () => {
    const r = await cli('expand', 'theta(z)^1000000', '--to', '200000');
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/SC-E005: the expansion would need about [\d.]+e\+\d+ coefficients, more than --max-terms 10000000/);
    const small = await cli('expand', 'phi_{0,1}', '--to', '10', '--max-terms', '100');
    expect(small.code).toBe(1);
    expect(small.stderr).toContain('more than --max-terms 100');
  });

  it('usage errors exit 2', async () => {
    expect((await cli('expand', 'E_4', '--to', 'abc')).code).toBe(2);
    expect((await cli('expand', 'E_4', '--bogus')).code).toBe(2);
    expect((await cli('expand')).code).toBe(2);
    expect((await cli('expand', 'E_4', '--format', 'junit')).code).toBe(2);
  });

  it('an expression starting with - follows --', async () => {
    const r = await cli('expand', '--to', '1', '--', '-E_4');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('q^0  -1');
    expect(r.stdout).toContain('q^1  -240');
  });
});
