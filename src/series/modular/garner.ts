/**
 * Garner's mixed-radix Chinese remaindering (Knuth, TAOCP vol. 2, §4.3.2): the mixed-radix
 * digits are found in word-size arithmetic, and JSBI is used only to assemble each
 * result. The representative is the one in (−M/2, M/2], M the product of the primes,
 * which is the integer itself whenever |integer| < M/2 (MATH.md §8).
 */
import { JSBI, type Int, int } from '../integer.js';
import { mulmod, invmod } from './mulmod.js';
import type { NttPrime } from './ntt-primes.js';

export function garner(rs: readonly Int32Array[], primes: readonly NttPrime[], len: number): Int[] {
  const k = primes.length;
  const inv: number[][] = primes.map((pi, i) => primes.map((pj, j) => (j > i ? invmod(pi.p % pj.p, pj.p) : 0)));
  let M = int(1);
  for (const pr of primes) M = JSBI.multiply(M, int(pr.p));
  const halfM = JSBI.divide(M, int(2));
  const out: Int[] = new Array<Int>(len);
  const v = new Array<number>(k);
  for (let n = 0; n < len; n++) {
    for (let j = 0; j < k; j++) {
      const pj = primes[j]!.p;
      const pinv = 1 / pj;
      let x = rs[j]![n]!;
      for (let i = 0; i < j; i++) {
        x = x - v[i]!;
        if (x < 0) x += pj;
        x = mulmod(x, inv[i]![j]!, pj, pinv);
      }
      v[j] = x;
    }
    let top = k - 1;
    while (top > 0 && v[top] === 0) top--;
    if (top === 0 && k > 1) {
      out[n] = int(v[0]!);
      continue;
    }
    let acc = int(v[top]!);
    for (let j = top - 1; j >= 0; j--) acc = JSBI.add(JSBI.multiply(acc, int(primes[j]!.p)), int(v[j]!));
    out[n] = JSBI.greaterThan(acc, halfM) ? JSBI.subtract(acc, M) : acc;
  }
  return out;
}

