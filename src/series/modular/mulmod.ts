/**
 * Arithmetic modulo a prime p < 2^30 in plain JavaScript numbers. The product a·b of
 * two residues needs 60 bits, more than a double holds, so the quotient ⌊a·b/p⌋ is
 * estimated in floating point (off by at most one or two) and the remainder is taken
 * exactly in 32-bit wrapping arithmetic with Math.imul: a·b − q·p is congruent to its
 * low 32 bits and lies in (−2p, 3p) ⊂ int32, so a final correction by ±p is exact.
 */
export function mulmod(a: number, b: number, p: number, pinv: number): number {
  const q = Math.floor(a * b * pinv);
  let r = (Math.imul(a, b) - Math.imul(q, p)) | 0;
  while (r < 0) r += p;
  while (r >= p) r -= p;
  return r;
}

export function powmod(base: number, e: number, p: number): number {
  const pinv = 1 / p;
  let r = 1;
  let b = base % p;
  let k = e;
  while (k > 0) {
    if (k & 1) r = mulmod(r, b, p, pinv);
    b = mulmod(b, b, p, pinv);
    k = Math.floor(k / 2);
  }
  return r;
}

/**
 * x mod p in [0, p) for an integer |x| < 2^53 held in a double: ⌊x/p⌋ in floating
 * point is off by at most one and x − q·p is exact, so one correction either way
 * suffices (much cheaper than the floating-point remainder `%`).
 */
export function reduceDouble(x: number, p: number, pinv: number): number {
  const v = x - Math.floor(x * pinv) * p;
  return v < 0 ? v + p : v >= p ? v - p : v;
}

/** 1/1, …, 1/n mod p (n < p) by inv(i) = −⌊p/i⌋·inv(p mod i), in O(n). */
export function inverseTable(n: number, p: number): Int32Array {
  const inv = new Int32Array(n + 1);
  const pinv = 1 / p;
  if (n >= 1) inv[1] = 1;
  for (let i = 2; i <= n; i++) inv[i] = p - mulmod(Math.floor(p / i), inv[p % i]!, p, pinv);
  return inv;
}

/** The inverse of a (≠ 0 mod p) by Fermat's little theorem. */
export function invmod(a: number, p: number): number {
  return powmod(a, p - 2, p);
}

/**
 * Shoup's multiplication by a fixed w with a precomputed quotient, in doubles: wq = w/p
 * rounded down by 2^−40 relative (shoupQuotient). For x < p < 2^30 the double x·wq lies
 * in (t − 2^−9, t), t = x·w/p — three roundings of 2^−53 each cannot undo a lowering of
 * 2^−40 — so q = ⌊x·wq⌋ is ⌊t⌋ or ⌊t⌋ − 1, x·w − q·p lies in [0, 2p), and one
 * correction finishes: one multiplication where mulmod takes two.
 */
const SHOUP_DOWN = 1 - 2 ** -40;

export function shoupQuotient(w: number, p: number): number {
  return (w / p) * SHOUP_DOWN;
}

/** x·w mod p for residues x, w (x < p) and wq = shoupQuotient(w, p). */
export function mulShoup(x: number, w: number, wq: number, p: number): number {
  const q = (x * wq) | 0;
  const r = ((Math.imul(x, w) - Math.imul(q, p)) | 0) - p;
  return r + ((r >> 31) & p);
}
