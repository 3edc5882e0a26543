/** Types of checksum.mjs, for the TypeScript test beside it (test/bench/checksum.test.ts). */
import type JSBI from 'jsbi';

export interface ChecksumInput {
  readonly qDen: number;
  readonly den: JSBI;
  readonly slices: readonly { readonly lo: number; readonly c: readonly JSBI[] }[];
}
export interface Checksum {
  sum: string;
  wsum: string;
  leadIndex: number;
}
export declare const P: JSBI;
export declare function residue(x: JSBI): JSBI;
export declare function powMod(base: JSBI, n: number | JSBI): JSBI;
export declare function seriesChecksum(series: ChecksumInput): Checksum;
