/**
 * chevrotain's runtime, from the single-file ESM build it ships. Its package entry
 * loads the library as some 700 modules (lodash-es among them): about 350 ms in every
 * process and in every worker thread of `--jobs`, more than a small collection takes
 * to check. The build beside it, lib/chevrotain.mjs, loads in under 20 ms. The entry
 * serves if the build is ever missing; a test checks that both export the same names.
 * Every runtime import of chevrotain must come from here: the two copies do not know
 * each other's classes (the entry's generateCstDts stops with "non exhaustive match" on
 * a grammar the build recorded), and one entry import would load the 700 modules anyway.
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

export const { createToken, createTokenInstance, Lexer, CstParser, tokenMatcher, createSyntaxDiagramsCode, generateCstDts } = chevrotain;
