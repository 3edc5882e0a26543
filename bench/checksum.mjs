/**
 * Checksums of an expanded q,ζ-series, so that a benchmark run can be compared with
 * another run (or another back-end) without printing thousands of huge integers.
 * Residues modulo the Mersenne prime P = 2^61 − 1, as decimal strings (they do not
 * fit a double):
 *   sum  = Σ c                          (mod P)
 *   wsum = Σ c(k,e) · 3^k · 5^(e+1000)  (mod P)
 * over every stored coefficient c; k = integer q-steps past the leading q-power (the
 * first non-zero slice), e = the ζ-exponent in units of ½. Negative c reduce to the
 * residue in [0, P). The series must have integer coefficients (den = 1).
 *
 * Arithmetic is exact modular arithmetic on JSBI values, as in the engine (the
 * project card prefers JSBI to native bigint); nothing here is on a timed path.
 */
import JSBI from 'jsbi';

export const P = JSBI.BigInt('2305843009213693951'); // 2^61 − 1
const ZERO = JSBI.BigInt(0);
const ONE = JSBI.BigInt(1);
const THREE = JSBI.BigInt(3);
const FIVE = JSBI.BigInt(5);
const TWO = JSBI.BigInt(2);
const P_MINUS_2 = JSBI.subtract(P, TWO);
/** Keeps 5-exponents non-negative for every ζ-exponent e ≥ −1000 (halves). */
const E_OFFSET = 1000;

/** The residue of an integer x in [0, P). */
export function residue(x) {
  const r = JSBI.remainder(x, P);
  return JSBI.lessThan(r, ZERO) ? JSBI.add(r, P) : r;
}

function mulMod(a, b) {
  return JSBI.remainder(JSBI.multiply(a, b), P);
}

function addMod(a, b) {
  const s = JSBI.add(a, b);
  return JSBI.lessThan(s, P) ? s : JSBI.subtract(s, P);
}

/** base^n mod P for an integer n of any sign (P is prime; base must be prime to P). */
export function powMod(base, n) {
  if (typeof n === 'number' && n < 0) return powMod(powMod(base, P_MINUS_2), -n);
  let result = ONE;
  let b = residue(base);
  let e = typeof n === 'number' ? JSBI.BigInt(n) : n;
  while (JSBI.greaterThan(e, ZERO)) {
    if (!JSBI.equal(JSBI.remainder(e, TWO), ZERO)) result = mulMod(result, b);
    e = JSBI.divide(e, TWO);
    if (JSBI.greaterThan(e, ZERO)) b = mulMod(b, b);
  }
  return result;
}

/**
 * Checksums of a series (a QZSeries, dense or sparse slices).
 * Returns `{ sum, wsum }` as decimal strings and `leadIndex`, the index of the first
 * non-zero slice (−1 for the zero series). Throws if den ≠ 1 or a non-zero slice
 * lies off the integer-step grid of the leading power.
 */
/** Whether a slice (dense `{ lo, c }` or sparse `{ kind: 'sparse', exps, vals }`) is zero. */
function sliceIsZero(s) {
  return s.kind === 'sparse' ? s.vals.length === 0 : s.c.every((v) => JSBI.equal(v, ZERO));
}

/** Calls f(exponent vector in halves, numerator) for every non-zero term of a slice. */
function forEachTerm(s, f) {
  if (s.kind === 'sparse') {
    s.vals.forEach((v, i) => f(s.exps[i], v));
    return;
  }
  s.c.forEach((v, k) => {
    if (!JSBI.equal(v, ZERO)) f([s.lo + k], v);
  });
}

export function seriesChecksum(series, originIndex = null) {
  if (!JSBI.equal(series.den, ONE)) {
    throw new Error(`checksum needs integer coefficients, got denominator ${series.den.toString()}`);
  }
  const slices = series.slices;
  const leadIndex = slices.findIndex((s) => !sliceIsZero(s));
  let sum = ZERO;
  let wsum = ZERO;
  if (leadIndex < 0) return { sum: '0', wsum: '0', leadIndex };
  const pow5 = new Map();
  const weight5 = (e) => {
    let w = pow5.get(e);
    if (w === undefined) {
      w = powMod(FIVE, e + E_OFFSET);
      pow5.set(e, w);
    }
    return w;
  };
  let pow3 = ONE; // 3^k for the current k
  let k = 0;
  // k counts integer q-steps from the leading power, or from `originIndex` when given
  // (W4: from q^0, so that c_0 = 0 enters the weighted sum as the issue defines it).
  const origin = originIndex ?? leadIndex;
  for (let i = origin; i < slices.length; i++) {
    const s = slices[i];
    const offset = i - origin;
    if (offset % series.qDen !== 0) {
      if (!sliceIsZero(s)) throw new Error(`non-zero slice ${i} is not an integer number of q-steps past the lead`);
      continue;
    }
    const kHere = offset / series.qDen;
    while (k < kHere) {
      pow3 = mulMod(pow3, THREE);
      k++;
    }
    // Several variables: e is the sum of the exponent vector's entries (in halves).
    forEachTerm(s, (e, c) => {
      const r = residue(c);
      sum = addMod(sum, r);
      wsum = addMod(wsum, mulMod(r, mulMod(pow3, weight5(e.reduce((a, b) => a + b, 0)))));
    });
  }
  return { sum: sum.toString(), wsum: wsum.toString(), leadIndex };
}
