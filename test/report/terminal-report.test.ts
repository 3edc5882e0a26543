/** The terminal reporter: marks that need no colour, details per verdict, verbose, summary, colour only when asked. */
import { describe, expect, it } from 'vitest';
import { REPORTERS, type ReportInput } from '../../src/report/index.js';
import type { Verdict } from '../../src/verdict/index.js';
import { ASSUMED, BY_TYPE, ERROR, PROVED, REFUTED, SOURCE, UNPROVED } from './fixtures.js';

const ANSI = /\u001b\[/;
const text = REPORTERS.get('text')!;

function render(verdicts: Verdict[], color = false, verbose = false): string {
  const input: ReportInput = { verdicts, sources: new Map([['x.claim', SOURCE]]), toolVersion: '0.0.0' };
  return text.render(input, { color, verbose });
}

describe('terminal report', () => {
  it('one line per claim with a spelled-out mark, the name and file:line', () => {
    const out = render([PROVED, REFUTED, ERROR, UNPROVED]);
    expect(out).toContain('✓ proved    cusp form  (x.claim:2)\n');
    expect(out).toContain('✗ refuted   a wrong constant  (x.claim:5)\n');
    expect(out).toContain('! error     bad  (x.claim:3)\n');
    // An unnamed claim is named by its place; it is not repeated.
    expect(out).toContain('? unproved  y.claim:1  [expect unproved]\n');
  });

  it('under refuted: the first mismatch and the reason', () => {
    expect(render([REFUTED])).toContain('    at q^1 ζ^0: left -2, right -288/143\n    a coefficient inside the bound differs\n');
  });

  it('under error: the diagnostic quoted from the file with a caret', () => {
    const out = render([ERROR]);
    expect(out).toContain('    x.claim:3:14: error SC-E003: the terms of this sum have different types\n');
    expect(out).toContain('    claim "bad": E_4 + E_6 == 0\n');
    expect(out).toContain('                 ^~~~~~~~~\n');
  });

  it('under unproved: the reason', () => {
    expect(render([UNPROVED])).toContain('    no proven type: E_2 is quasi-modular\n');
  });

  it('a proof relying on an assumption says so', () => {
    expect(render([ASSUMED])).toContain('✓ proved, assuming g  with an assumption');
  });

  it('a missed expectation is flagged in words', () => {
    expect(render([{ ...UNPROVED, verdict: 'proved' }])).toContain('[expect unproved]  not as expected');
  });

  it('--verbose: type, compared sides, bound derivation, coefficient count, margin', () => {
    const out = render([PROVED, BY_TYPE], false, true);
    expect(out).toContain('    type        weight 10, index 1, multiplier trivial (modular)\n');
    expect(out).toContain('    compared    the two sides as they are\n');
    expect(out).toContain('    left        eta^24*phi_{-2,1}\n');
    expect(out).toContain('    bound       (K + 2m)/12 = 1\n');
    expect(out).toContain('    checked     9 coefficients up to q^1; margin compared up to q^3\n');
    expect(out).toContain('    left type   weight 4, index 0, multiplier trivial (modular)\n');
    expect(out).toContain('    right type  weight 6, index 0, multiplier trivial (modular)\n');
  });

  it('the summary line counts verdicts and says whether all were as expected', () => {
    expect(render([PROVED, BY_TYPE])).toMatch(/\n2 claims: 1 proved, 1 refuted, 0 unproved, 0 errors; all as expected\n$/);
    expect(render([PROVED, REFUTED, ERROR])).toMatch(/3 claims: 1 proved, 1 refuted, 0 unproved, 1 error; 2 not as expected\n$/);
  });

  it('colour only when asked', () => {
    expect(render([PROVED, REFUTED, ERROR, UNPROVED], false, true)).not.toMatch(ANSI);
    expect(render([PROVED, REFUTED], true)).toMatch(ANSI);
  });

  it('control characters from a claim file cannot reach the terminal', () => {
    const out = render([{ ...REFUTED, name: 'evil \u001b[2J name', reason: 'bell\u0007' }]);
    expect(out).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f]/);
    expect(out).toContain('evil \uFFFD[2J name');
  });
});
