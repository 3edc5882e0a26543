/** The file-name rule of `--certificates DIR` (check/certificate-file-names.ts, README). */
import { describe, expect, it } from 'vitest';
import { certificateFileNames, slug } from '../../src/check/index.js';

describe('certificate file names', () => {
  it('slugs: NFKD without marks, lower case, runs of other characters to one dash, trimmed and capped', () => {
    expect(slug('Thm 9.3, weight 12', 'claim')).toBe('thm-9-3-weight-12');
    expect(slug('Théorème à la main', 'claim')).toBe('theoreme-a-la-main');
    expect(slug('phi_{-2,1} is weak', 'claim')).toBe('phi-2-1-is-weak');
    expect(slug('ϑ²/η⁶', 'claim')).toBe('2-6');
    expect(slug('ϑ/η', 'claim')).toBe('claim');
    expect(slug('x'.repeat(100), 'claim')).toHaveLength(60);
  });

  it('file stem, two dashes, claim name; line-N for an unnamed claim', () => {
    expect(
      certificateFileNames([
        { file: 'claims/notebook.claim', line: 4, name: 'A is the weak generator' },
        { file: 'claims/notebook.claim', line: 9, name: 'claims/notebook.claim:9' },
      ]),
    ).toEqual(['notebook--a-is-the-weak-generator.json', 'notebook--line-9.json']);
  });

  it('collisions get -2, -3 in the order given, also across folders with the same file name', () => {
    expect(
      certificateFileNames([
        { file: 'a/x.claim', line: 1, name: 'E_4 squared' },
        { file: 'a/x.claim', line: 2, name: 'E_4, squared' },
        { file: 'b/x.claim', line: 1, name: 'e 4 squared' },
        { file: 'b/x.claim', line: 2, name: 'e-4-squared-2' },
      ]),
    ).toEqual(['x--e-4-squared.json', 'x--e-4-squared-2.json', 'x--e-4-squared-3.json', 'x--e-4-squared-2-2.json']);
  });

  it('is stable: the same claims give the same names', () => {
    const claims = [{ file: 'f.claim', line: 1, name: 'one' }, { file: 'f.claim', line: 2, name: 'one' }];
    expect(certificateFileNames(claims)).toEqual(certificateFileNames(claims));
  });
});
