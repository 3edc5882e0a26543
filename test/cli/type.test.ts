/** `sturmcheck type EXPR` end to end (in-process). */
import { describe, expect, it } from 'vitest';
import { cli } from '../helpers/cli.js';

describe('type', () => {
  it('a theta quotient: type, the divisor rule, the Heisenberg character and the bound', async () => {
    const r = await cli('type', 'theta(2z)/theta(z)');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('type         jacobi(weight 0, index 3/2)\n');
    expect(r.stdout).toContain('class        modular\n');
    expect(r.stdout).toContain('theta block  theta(2z)*theta(z)^-1: holomorphic by the divisor rule');
    expect(r.stdout).toContain('heisenberg   non-trivial');
    // Theorem A: (K + 2m)/12 = (0 + 3)/12
    expect(r.stdout).toContain('bound        q-order 1/4');
    expect(r.stdout).toContain('derivation   (K + 2m)/12');
  });

  it('a meromorphic quotient names its divisors and bounds the numerator', async () => {
    const r = await cli('type', 'phi_{0,1}/phi_{-2,1}');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('class        meromorphic');
    expect(r.stdout).toContain('divisors     phi_{-2,1}');
    expect(r.stdout).toContain('of the numerator after clearing the divisors');
  });

  it('a quasi-modular expression gives its reasons', async () => {
    const r = await cli('type', 'Dq(E_4)');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('class        quasi: Dq(E_4) is a bare derivative');
    expect(r.stdout).toContain('nominal');
  });

  it('eta has a character and a trivial Heisenberg character', async () => {
    const r = await cli('type', 'η');
    expect(r.stdout).toContain('jacobi(weight 1/2, index 0, character eta^1)');
    expect(r.stdout).toContain('heisenberg   trivial');
  });

  it('--verbose shows the normalised expression', async () => {
    const r = await cli('type', '--verbose', 'theta(z)^2/eta^6');
    expect(r.stdout).toContain('normalised   eta^-6*theta(z)^2');
  });

  it('an expression starting with - follows --', async () => {
    const r = await cli('type', '--', '-E_4');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('jacobi(weight 4, index 0)');
  });

  it('1 for an ill-typed expression, with the diagnostic', async () => {
    const r = await cli('type', 'E_4 + E_6');
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('the terms of this sum have different types');
    expect(r.stderr).toContain('^~~');
  });

  it('1 for a syntax error', async () => {
    const r = await cli('type', 'theta(z');
    expect(r.code).toBe(1);
    expect(r.stderr).toContain("expected ')'");
  });

  it.each([[[]], [['E_4', 'E_6']], [['--format', 'json', 'E_4']], [['--depth', '3', 'E_4']]])('2 for usage %j', async (rest) => {
    const r = await cli('type', ...rest);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
  });
});
