/**
 * Garner's mixed-radix Chinese remaindering (Knuth, TAOCP vol. 2, §4.3.2): the mixed-radix
 * digits v_i (x = v_0 + p_0·v_1 + p_0p_1·v_2 + …, 0 ≤ v_i < p_i) are found in word-size
 * arithmetic, and JSBI is used only to assemble each result. The representative is the
 * one in (−M/2, M/2], M the product of the primes, which is the integer itself whenever
 * |integer| < M/2 (MATH.md §8). The primes are odd, so (M − 1)/2 has the digits
 * (p_i − 1)/2 and the sign is read off the digits from the top; a negative x is
 * assembled as −(M − x), whose digits are those of M − 1 − x (p_i − 1 − v_i) plus one.
 */
import { type Int, int, ZERO } from '../integer.js';
import { LIMB, intFromLimbs, mulAddLimbs } from '../integer-limbs.js';
import { mulmod, invmod } from './mulmod.js';
import type { NttPrime } from './ntt-primes.js';

interface GarnerTables {
  /** inv[i][j] = p_i⁻¹ mod p_j for i < j. */
  readonly inv: readonly (readonly number[])[];
}

const tables = new WeakMap<readonly NttPrime[], GarnerTables>();

function tablesFor(primes: readonly NttPrime[]): GarnerTables {
  let t = tables.get(primes);
  if (t === undefined) {
    t = {
      inv: primes.map((pi, i) => primes.map((pj, j) => (j > i ? invmod(pi.p % pj.p, pj.p) : 0))),
    };
    tables.set(primes, t);
  }
  return t;
}

/** Whether the digits exceed those of (M − 1)/2, i.e. x > M/2. */
function aboveHalf(v: readonly number[], primes: readonly NttPrime[]): boolean {
  for (let j = v.length - 1; j >= 0; j--) {
    const h = (primes[j]!.p - 1) / 2;
    if (v[j]! !== h) return v[j]! > h;
  }
  return false;
}

/**
 * ±Σ v_j·Π_{i<j} p_i, Horner from the top: in doubles while exact (below 2^53), then in
 * 30-bit limbs (integer-limbs.ts), one JSBI built at the end.
 */
function assemble(v: readonly number[], primes: readonly NttPrime[], limbs: Float64Array, negative: boolean): Int {
  let j = v.length - 1;
  while (j > 0 && v[j] === 0) j--;
  let small = v[j]!;
  for (j--; j >= 0 && small <= (2 ** 53 - primes[j]!.p) / primes[j]!.p; j--) small = small * primes[j]!.p + v[j]!;
  if (j < 0) return int(negative ? -small : small);
  const top = Math.floor(small / LIMB);
  limbs[0] = small - top * LIMB;
  limbs[1] = top;
  let len = 2;
  for (; j >= 0; j--) len = mulAddLimbs(limbs, len, primes[j]!.p, v[j]!);
  return intFromLimbs(limbs, len, negative);
}

export function garner(rs: readonly Int32Array[], primes: readonly NttPrime[], len: number): Int[] {
  const k = primes.length;
  const { inv } = tablesFor(primes);
  const out: Int[] = new Array<Int>(len);
  const v = new Array<number>(k);
  // k digits below 2^30 fit k + 1 limbs of 30 bits
  const limbs = new Float64Array(k + 2);
  for (let n = 0; n < len; n++) {
    let zero = true;
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
      if (x !== 0) zero = false;
    }
    if (zero) {
      out[n] = ZERO;
      continue;
    }
    if (!aboveHalf(v, primes)) {
      out[n] = assemble(v, primes, limbs, false);
      continue;
    }
    // M − x = (M − 1 − x) + 1: complement the digits, then add one with carries
    let carry = 1;
    for (let j = 0; j < k; j++) {
      let d = primes[j]!.p - 1 - v[j]! + carry;
      carry = 0;
      if (d === primes[j]!.p) {
        d = 0;
        carry = 1;
      }
      v[j] = d;
    }
    out[n] = assemble(v, primes, limbs, true);
  }
  return out;
}
