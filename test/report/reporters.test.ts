/** The name → reporter map of `--format`. */
import { describe, expect, it } from 'vitest';
import { REPORTERS } from '../../src/report/index.js';
import { optionSpec } from '../../src/cli/options.js';

describe('reporters', () => {
  it('text, json and junit exist', () => {
    expect([...REPORTERS.keys()]).toEqual(['text', 'json', 'junit']);
  });

  it('every reporter is a choice of --format', () => {
    const choices = optionSpec('format')!.choices!;
    for (const name of REPORTERS.keys()) expect(choices).toContain(name);
  });
});
