/**
 * JSBI values from 30-bit limbs. Reconstruction by CRT builds tens of thousands of
 * integers of a few words each; assembling them with JSBI's public arithmetic costs an
 * allocation per operation. A JSBI is an array of 30-bit digits, least significant
 * first, with a sign (jsbi 4.x, `new JSBI(length, sign)`); building it from its digits
 * once is many times faster. That layout is not part of JSBI's documented interface,
 * so it is checked once against the public constructor (`fromLimbsChecked`) and the
 * public arithmetic serves whenever the check fails.
 */
import { JSBI, type Int, ZERO, int } from './integer.js';

export const LIMB_BITS = 30;
export const LIMB = 2 ** LIMB_BITS;

interface DigitArray {
  [i: number]: number;
  sign: boolean;
}

type DigitConstructor = new (length: number, sign: boolean) => Int;

/** Through JSBI's digit layout: the top limb must be non-zero (len ≥ 1). */
function fromDigits(limbs: ArrayLike<number>, len: number, negative: boolean): Int {
  const x = new (JSBI as unknown as DigitConstructor)(len, negative);
  const d = x as unknown as DigitArray;
  for (let i = 0; i < len; i++) d[i] = limbs[i]! | 0;
  return x;
}

/** Through the public arithmetic, from the top limb down. */
function fromPublic(limbs: ArrayLike<number>, len: number, negative: boolean): Int {
  let acc = int(limbs[len - 1]!);
  const base = int(LIMB);
  for (let i = len - 2; i >= 0; i--) acc = JSBI.add(JSBI.multiply(acc, base), int(limbs[i]!));
  return negative ? JSBI.unaryMinus(acc) : acc;
}

/** Whether fromDigits agrees with the public constructor on values of one to four limbs, both signs. */
function digitsLayoutHolds(): boolean {
  const samples: number[][] = [[1], [LIMB - 1], [5, 1], [0, 0, 3], [LIMB - 1, 12345, LIMB - 1, 7]];
  try {
    return samples.every((l) => [false, true].every((neg) => JSBI.equal(fromDigits(l, l.length, neg), fromPublic(l, l.length, neg)) && fromDigits(l, l.length, neg).toString() === fromPublic(l, l.length, neg).toString()));
  } catch {
    return false;
  }
}

const DIGITS_OK = digitsLayoutHolds();

/** Whether the installed JSBI has the digit layout (else the public arithmetic builds every value). */
export function digitLayoutInUse(): boolean {
  return DIGITS_OK;
}

/**
 * The integer ±Σ limbs[i]·2^(30i) for limbs in [0, 2^30); leading zero limbs are allowed.
 * `viaDigits` forces a path (tests compare them).
 */
export function intFromLimbs(limbs: ArrayLike<number>, len: number, negative: boolean, viaDigits = DIGITS_OK): Int {
  let n = len;
  while (n > 0 && limbs[n - 1] === 0) n--;
  if (n === 0) return ZERO;
  // below 2^53 the public constructor from a double is as quick
  if (n === 1 || (n === 2 && limbs[1]! < 2 ** 23)) {
    const v = n === 1 ? limbs[0]! : limbs[0]! + limbs[1]! * LIMB;
    return int(negative ? -v : v);
  }
  return viaDigits ? fromDigits(limbs, n, negative) : fromPublic(limbs, n, negative);
}

/**
 * limbs ← limbs·m + a in place (m, a < 2^30): the limb count grows by at most one;
 * returns the new count. Each limb product is split at 2^15 so every step is exact in doubles.
 */
export function mulAddLimbs(limbs: Float64Array, len: number, m: number, a: number): number {
  const ml = m % 32768;
  const mh = (m - ml) / 32768;
  let carry = a;
  for (let i = 0; i < len; i++) {
    const x = limbs[i]!;
    const hi = x * mh;
    const hl = hi % 32768;
    const s = x * ml + carry + hl * 32768;
    const c = Math.floor(s / LIMB);
    limbs[i] = s - c * LIMB;
    carry = c + (hi - hl) / 32768;
  }
  let n = len;
  while (carry > 0) {
    const c = Math.floor(carry / LIMB);
    limbs[n++] = carry - c * LIMB;
    carry = c;
  }
  return n;
}
