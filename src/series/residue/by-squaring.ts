/**
 * f^k, k ≥ 1, by repeated squaring over any multiplication. `multiply(a, b, j)` forms
 * a·b = f^j; callers use j to keep each partial power to the order it is needed to
 * (X − (k − j)·v(f): past X when v(f) < 0, since the factors still to come bring the
 * order down again).
 */
export function bySquaring<T>(f: T, k: number, multiply: (a: T, b: T, j: number) => T): T {
  if (k < 1) throw new RangeError('internal: repeated squaring needs k ≥ 1');
  let result: T | null = null;
  let have = 0;
  let base = f;
  let pow = 1;
  for (let e = k; e > 0; e >>= 1) {
    if (e & 1) {
      have += pow;
      result = result === null ? base : multiply(result, base, have);
    }
    if (e > 1) {
      pow *= 2;
      base = multiply(base, base, pow);
    }
  }
  return result!;
}
