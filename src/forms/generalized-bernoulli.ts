/**
 * Generalized Bernoulli numbers B_{r,χ_D} of the quadratic character χ_D = (D/·) of a
 * fundamental discriminant D (D = 1: the trivial character):
 *   B_{r,χ} = |D|^{r−1} Σ_{a=1}^{|D|} χ(a) B_r(a/|D|)
 * (L. C. Washington, *Introduction to Cyclotomic Fields*, 2nd ed., 1997, Prop. 4.1),
 * so that L(1−r, χ) = −B_{r,χ}/r for r ≥ 1 (ibid., Thm 4.2). For the trivial character
 * this gives B_r(1), i.e. B_r except B_{1,χ_1} = +1/2, and L(0, χ_1) = ζ(0) = −1/2.
 */
import { JSBI, type Int, ZERO, int } from '../series/integer.js';
import { type Rational, RZERO, radd, rmul, rational, rpow, rat } from '../series/rational.js';
import { bernoulli, bernoulliPolynomialCoefficients } from './bernoulli.js';
import { isFundamentalDiscriminant, kroneckerRow } from './kronecker.js';

/** Limb base of the power-sum kernel: limb·a and |Σ ±limb| stay below 2^53 for a, |D| < 2^26. */
const LIMB = 2 ** 26;

/** The half power sums of halfPowerSums, cached per D and grown on demand. */
const powerSumCache = new Map<number, Int[]>();
const valueCache = new Map<string, Rational>();

/** Limbs enough for m^jMax, plus one spare for the last carry. */
function limbCount(m: number, jMax: number): number {
  return Math.ceil((jMax * Math.log2(m + 1)) / Math.log2(LIMB)) + 2;
}

/**
 * Multiplies the little-endian limbs power[0..used) (each in [0, LIMB)) by a factor
 * below LIMB, in place; returns the new number of used limbs.
 */
function multiplyLimbs(power: Float64Array, used: number, factor: number): number {
  let carry = 0;
  let length = used;
  for (let i = 0; i < length; i++) {
    const x = power[i]! * factor + carry;
    carry = Math.floor(x / LIMB);
    power[i] = x - carry * LIMB;
  }
  while (carry > 0) {
    const high = Math.floor(carry / LIMB);
    power[length++] = carry - high * LIMB;
    carry = high;
  }
  return length;
}

/** Σ acc[i]·LIMB^i for signed limbs whose carries were never propagated. */
function limbsToInt(acc: Float64Array): Int {
  const base = int(LIMB);
  let value = ZERO;
  for (let i = acc.length - 1; i >= 0; i--) value = JSBI.add(JSBI.multiply(value, base), int(acc[i]!));
  return value;
}

/**
 * Σ_{a=1}^{m} w(a) a^j for j = 0..jMax with w(a) = weights[a] ∈ {−1, 0, 1} (weights[0]
 * unused), exactly. Powers and sums live in float limbs of 26 bits, not JSBI values: the
 * inner loop runs m·jMax times per discriminant, and JSBI (with its garbage) was several
 * times slower there. Sums of up to m < 2^26 signed limbs stay exact without carrying.
 */
function characterPowerSums(weights: Int8Array, jMax: number): Int[] {
  const m = weights.length - 1;
  if (m >= LIMB) throw new RangeError(`range too large for the power-sum kernel: ${m}`);
  const width = limbCount(m, jMax);
  const acc: Float64Array[] = [];
  for (let j = 0; j <= jMax; j++) acc.push(new Float64Array(width));
  const power = new Float64Array(width);
  for (let a = 1; a <= m; a++) {
    const w = weights[a]!;
    if (w === 0) continue;
    power.fill(0);
    power[0] = 1;
    let used = 1;
    acc[0]![0]! += w;
    for (let j = 1; j <= jMax; j++) {
      used = multiplyLimbs(power, used, a);
      const target = acc[j]!;
      for (let i = 0; i < used; i++) target[i]! += w * power[i]!;
    }
  }
  return acc.map(limbsToInt);
}

/**
 * Σ_{1 ≤ a < |D|/2} χ_D(a) a^j for j = 0..jMax. Half the range suffices for |D| > 1:
 * χ(|D| − a) B_r(1 − a/|D|) = χ(−1)(−1)^r χ(a) B_r(a/|D|), and χ(−1) = (−1)^r whenever
 * B_{r,χ} can be non-zero, while χ(|D|/2) = 0 for even |D| > 2.
 */
function halfPowerSums(D: number, jMax: number): Int[] {
  const cached = powerSumCache.get(D);
  if (cached !== undefined && cached.length > jMax) return cached;
  const half = Math.floor((Math.abs(D) - 1) / 2);
  const sums = characterPowerSums(kroneckerRow(D, half), jMax);
  powerSumCache.set(D, sums);
  return sums;
}

/**
 * B_{r,χ_D} = 2 Σ_i b_i |D|^{r−1−i} S_i for |D| > 1, with b_i the coefficients of B_r(x)
 * and S_i the half power sums: the defining sum, folded and expanded so that only
 * integers are summed over a.
 */
function fromPowerSums(r: number, D: number): Rational {
  const f = Math.abs(D);
  const b = bernoulliPolynomialCoefficients(r);
  const S = halfPowerSums(D, r);
  let value = RZERO;
  for (let i = 0; i <= r; i++) {
    value = radd(value, rmul(rmul(b[i]!, rational(S[i]!)), rpow(rat(f), r - 1 - i)));
  }
  return rmul(rat(2), value);
}

/**
 * B_{r,χ_D} for r ≥ 1 and a fundamental discriminant D. It vanishes when
 * χ_D(−1) = sign(D) ≠ (−1)^r, except B_{1,χ_1} = 1/2 (Washington, §4.1: the generating
 * function Σ χ(a) t e^{at}/(e^{ft} − 1) has parity χ(−1) apart from the t/2 of the trivial
 * character), which skips the sum for half of all (r, D).
 */
export function generalizedBernoulli(r: number, D: number): Rational {
  if (!Number.isInteger(r) || r < 1) throw new RangeError(`generalizedBernoulli: r must be ≥ 1, got ${r}`);
  const key = `${r}:${D}`;
  const cached = valueCache.get(key);
  if (cached !== undefined) return cached;
  if (!isFundamentalDiscriminant(D)) throw new RangeError(`not a fundamental discriminant: ${D}`);
  if (r === 1 && D === 1) return rat(1, 2);
  if ((D < 0) !== (r % 2 === 1)) return RZERO;
  if (D === 1) return bernoulli(r);
  const value = fromPowerSums(r, D);
  valueCache.set(key, value);
  return value;
}
