/** Hand-made verdict records for reporter tests (the checker is tested elsewhere). */
import type { Verdict } from '../../src/verdict/index.js';
import { diagnostic } from '../../src/lang/index.js';

const WEIGHT_10 = { weight: '10', index: '1', multiplier: 'trivial', class: 'modular' } as const;

export const PROVED: Verdict = {
  file: 'x.claim',
  line: 2,
  name: 'cusp form',
  verdict: 'proved',
  expected: 'proved',
  type: WEIGHT_10,
  compared: 'sides',
  assumptions: [],
  bound: { theorem: 'A', qOrder: '1', coefficientsChecked: 9, derivation: '(K + 2m)/12 = 1', marginTo: '3' },
  normalForm: { compared: 'sides', left: 'eta^24*phi_{-2,1}', right: '1/144*(E_6*E_{4,1} - E_4*E_{6,1})', type: WEIGHT_10 },
  seconds: 0.012345,
  claimText: 'claim "cusp form": …',
};

export const REFUTED: Verdict = {
  ...PROVED,
  line: 5,
  name: 'a wrong constant',
  verdict: 'refuted',
  bound: undefined,
  mismatch: { q: '1', zeta: ['0'], left: '-2', right: '-288/143' },
  reason: 'a coefficient inside the bound differs',
  seconds: 0.0004,
};

export const BY_TYPE: Verdict = {
  file: 'x.claim',
  line: 7,
  name: 'weights differ',
  verdict: 'refuted',
  expected: 'refuted',
  type: { weight: '4', index: '0', multiplier: 'trivial', class: 'modular' },
  leftType: { weight: '4', index: '0', multiplier: 'trivial', class: 'modular' },
  rightType: { weight: '6', index: '0', multiplier: 'trivial', class: 'modular' },
  assumptions: [],
  reason: 'the sides have different types',
  seconds: 0,
};

export const SOURCE = 'line one\nline two\nclaim "bad": E_4 + E_6 == 0\n';

export const ERROR: Verdict = {
  file: 'x.claim',
  line: 3,
  name: 'bad',
  verdict: 'error',
  expected: 'proved',
  assumptions: [],
  reason: 'the terms of this sum have different types',
  seconds: 0,
  diagnostics: [
    diagnostic(
      { code: 'SC-E003', severity: 'error', template: 'the terms of this sum have different types' },
      {},
      { file: 'x.claim', startLine: 3, startColumn: 14, endLine: 3, endColumn: 23, startOffset: 31, endOffset: 40 },
    ),
  ],
};

export const UNPROVED: Verdict = {
  file: 'y.claim',
  line: 1,
  name: 'y.claim:1',
  verdict: 'unproved',
  expected: 'unproved',
  type: { weight: '6', index: '0', multiplier: 'trivial', class: 'quasi' },
  compared: 'sides',
  assumptions: [],
  reason: 'no proven type: E_2 is quasi-modular',
  seconds: 0.5,
};

export const ASSUMED: Verdict = { ...PROVED, line: 9, name: 'with an assumption', assumptions: ['g'] };
