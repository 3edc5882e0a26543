/**
 * chevrotain's runtime, from the single-file ESM build it ships. Its package entry
 * loads the library as some 700 modules (lodash-es among them): about 350 ms in every
 * process and in every worker thread of `--jobs`, more than a small collection takes
 * to check. The build beside it, lib/chevrotain.mjs, loads in under 20 ms. The entry
 * serves if the build is ever missing; a test checks that both export the same names.
 * Only generate-cst-types.ts, which the tests alone run, keeps the entry: the build's
 * generateCstDts stops with "non exhaustive match" on this grammar (chevrotain 11.2.0).
 */
import type * as Chevrotain from 'chevrotain';

/** lib/chevrotain.mjs, found from the entry (lib/src/api.js) that the package exports. */
export const CHEVROTAIN_BUILD = new URL('../chevrotain.mjs', import.meta.resolve('chevrotain')).href;

async function load(): Promise<typeof Chevrotain> {
  try {
    return (await import(CHEVROTAIN_BUILD)) as typeof Chevrotain;
  } catch {
    return await import('chevrotain');
  }
}

const chevrotain = await load();

export const { createToken, createTokenInstance, Lexer, CstParser, tokenMatcher, createSyntaxDiagramsCode } = chevrotain;
