/** The JSON reporter: exactly the fields of CLAIMS.md, absent ones omitted, nothing internal. */
import { describe, expect, it } from 'vitest';
import { REPORTERS, claimJson, checkJson } from '../../src/report/index.js';
import { roundSeconds } from '../../src/report/json-report.js';
import { ASSUMED, BY_TYPE, ERROR, PROVED, REFUTED, SOURCE, UNPROVED } from './fixtures.js';

const input = { verdicts: [PROVED, REFUTED, BY_TYPE, ERROR, UNPROVED, ASSUMED], sources: new Map([['x.claim', SOURCE]]), toolVersion: '1.2.3' };

describe('json report', () => {
  it('is { tool, version, claims, summary }', () => {
    const out = JSON.parse(REPORTERS.get('json')!.render(input, { color: true, verbose: true })) as Record<string, unknown>;
    expect(Object.keys(out)).toEqual(['tool', 'version', 'claims', 'summary']);
    expect(out['tool']).toBe('sturmcheck');
    expect(out['version']).toBe('1.2.3');
    expect(out['summary']).toEqual({ proved: 2, refuted: 2, unproved: 1, error: 1, asExpected: false });
  });

  it('a proved claim: the documented fields in order, the bound without its derivation', () => {
    const c = claimJson(PROVED);
    expect(Object.keys(c)).toEqual(['file', 'line', 'name', 'verdict', 'expected', 'type', 'compared', 'assumptions', 'bound', 'seconds']);
    expect(c.bound).toEqual({ theorem: 'A', qOrder: '1', coefficientsChecked: 9 });
  });

  it('a refuted claim carries the mismatch and the reason', () => {
    const c = claimJson(REFUTED);
    expect(c.mismatch).toEqual({ q: '1', zeta: ['0'], left: '-2', right: '-288/143' });
    expect(c.reason).toBe('a coefficient inside the bound differs');
    expect(c).not.toHaveProperty('bound');
  });

  it('leftType and rightType only when refuted by type', () => {
    expect(Object.keys(claimJson(BY_TYPE))).toEqual(['file', 'line', 'name', 'verdict', 'expected', 'type', 'leftType', 'rightType', 'assumptions', 'reason', 'seconds']);
    const notRefuted = claimJson({ ...BY_TYPE, verdict: 'error' });
    expect(notRefuted).not.toHaveProperty('leftType');
    expect(notRefuted).not.toHaveProperty('rightType');
  });

  it('never leaks diagnostics, the normal form or the claim text', () => {
    const text = JSON.stringify(checkJson(input));
    for (const internal of ['diagnostics', 'normalForm', 'claimText', 'derivation', 'marginTo']) expect(text).not.toContain(internal);
  });

  it('lists assumptions', () => {
    expect(claimJson(ASSUMED).assumptions).toEqual(['g']);
  });

  it('seconds are rounded to milliseconds', () => {
    expect(claimJson(PROVED).seconds).toBe(0.012);
    expect(roundSeconds(0.0004)).toBe(0);
    expect(roundSeconds(12.3456)).toBe(12.346);
  });
});
