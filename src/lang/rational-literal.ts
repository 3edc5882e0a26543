/** Rational literals of types and matrices (`-2`, `3/2`), in lowest terms. */

export type RationalLiteral = { readonly ok: true; readonly text: string } | { readonly ok: false };

/** `-4/6` → `-2/3`, `6/3` → `2`, `-0` → `0`; a zero denominator fails. */
export function reduceRational(negative: boolean, numerator: string, denominator: string | null): RationalLiteral {
  let n = BigInt(numerator);
  let d = denominator === null ? 1n : BigInt(denominator);
  if (d === 0n) return { ok: false };
  const g = gcd(n, d);
  n /= g;
  d /= g;
  const sign = negative && n !== 0n ? '-' : '';
  return { ok: true, text: d === 1n ? `${sign}${n}` : `${sign}${n}/${d}` };
}

function gcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a === 0n ? 1n : a;
}
