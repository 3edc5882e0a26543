/** `type` as text, from the checker's description. */
import { describe, expect, it } from 'vitest';
import { typeDescriptionText } from '../../src/report/index.js';
import { describeType, newEvalContext } from '../../src/check/index.js';
import { parseExpression } from '../../src/lang/index.js';

function describe1(text: string, verbose = false): string {
  const parsed = parseExpression(text, ['z']);
  return typeDescriptionText(text, describeType(parsed.expr!, newEvalContext(text, ['z'])), verbose);
}

describe('type description text', () => {
  it('the literal 0 has every type and needs no bound', () => {
    const out = describe1('0');
    expect(out).toContain('type         every type');
    expect(out).toContain('bound        none needed');
    expect(out).not.toContain('heisenberg');
  });

  it('a holomorphic form: no divisors, no theta block', () => {
    const out = describe1('phi_{10,1}');
    expect(out).toContain('type         jacobi(weight 10, index 1)\n');
    expect(out).toContain('divisors     none\n');
    expect(out).toContain('theta block  none\n');
    expect(out).toContain('bound        q-order 1\n');
  });
});
