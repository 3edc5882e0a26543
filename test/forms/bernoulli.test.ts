import { oeisIntegers as oeisTerms } from '../helpers/oeis.js';
import { describe, expect, it } from 'vitest';
import { bernoulli, bernoulliPolynomial, bernoulliPolynomialCoefficients } from '../../src/forms/bernoulli.js';
import { JSBI, type Int, int } from '../../src/series/integer.js';
import {
  type Rational,
  RZERO,
  radd,
  rdiv,
  req,
  rmul,
  rneg,
  rpow,
  rsub,
  rat,
  rational,
  rationalToString,
} from '../../src/series/rational.js';


const show = (x: Rational): string => rationalToString(x);

/**
 * Akiyama–Tanigawa algorithm: a second, independent route to B_n, with B_1 = +1/2
 * (M. Kaneko, *The Akiyama–Tanigawa algorithm for Bernoulli numbers*, J. Integer Seq. 3, 2000).
 */
function akiyamaTanigawa(n: number): Rational {
  const a: Rational[] = [];
  for (let m = 0; m <= n; m++) {
    a.push(rat(1, m + 1));
    for (let j = m; j >= 1; j--) a[j - 1] = rmul(rat(j), rsub(a[j - 1]!, a[j]!));
  }
  return a[0]!;
}

describe('bernoulli', () => {
  it('gives the leading coefficients −2k/B_k of E_4 … E_14', () => {
    const cases: Array<[number, string, Rational]> = [];
    // a(1)/a(0) of each Eisenstein series file is −2k/B_k (MATH.md §2: E_k = 1 − (2k/B_k) Σ σ_{k−1}(n) qⁿ).
    const files: Array<[number, string]> = [
      [4, 'A004009'], // OEIS A004009: E_4 = 1 + 240 q + …
      [6, 'A013973'], // OEIS A013973: E_6 = 1 − 504 q + …
      [8, 'A008410'], // OEIS A008410: E_8 = 1 + 480 q + …
      [10, 'A013974'], // OEIS A013974: E_10 = 1 − 264 q + …
      [12, 'A029828'], // OEIS A029828: 691·E_12 = 691 + 65520 q + …
      [14, 'A058550'], // OEIS A058550: E_14 = 1 − 24 q + …
    ];
    for (const [k, file] of files) {
      const terms = oeisTerms(file);
      cases.push([k, file, rational(terms[1]!, terms[0]!)]);
    }
    for (const [k, file, expected] of cases) {
      expect(show(rdiv(rat(-2 * k), bernoulli(k))), `${file}, k = ${k}`).toBe(show(expected));
    }
    // The same six numbers as stated in the task: 240, −504, 480, −264, 65520/691, −24.
    expect(cases.map(([, , x]) => show(x))).toEqual(['240', '-504', '480', '-264', '65520/691', '-24']);
  });

  it('has the textbook small values and vanishes at odd n > 1', () => {
    expect(show(bernoulli(0))).toBe('1'); // (common practice, no source)
    expect(show(bernoulli(1))).toBe('-1/2'); // (common practice, no source): the t/(e^t − 1) convention
    expect(show(bernoulli(2))).toBe('1/6'); // (common practice, no source)
    expect(show(bernoulli(4))).toBe('-1/30'); // (common practice, no source)
    expect(show(bernoulli(12))).toBe('-691/2730'); // (common practice, no source)
    for (let n = 3; n <= 41; n += 2) expect(show(bernoulli(n)), `B_${n}`).toBe('0'); // t/(e^t−1) + t/2 is even
  });

  it('agrees with the Akiyama–Tanigawa algorithm up to n = 60', () => {
    for (let n = 0; n <= 60; n++) {
      // Kaneko 2000: that algorithm yields B_1 = +1/2 and the same B_n otherwise.
      const expected = n === 1 ? rat(-1, 2) : akiyamaTanigawa(n);
      expect(show(bernoulli(n)), `B_${n}`).toBe(show(expected));
    }
  });

  it('rejects indices that are not natural numbers', () => {
    expect(() => bernoulli(-1)).toThrow(RangeError);
    expect(() => bernoulli(1.5)).toThrow(RangeError);
  });
});

describe('bernoulliPolynomial', () => {
  const points = [rat(0), rat(1), rat(1, 2), rat(-3, 7), rat(5, 3), rat(-2), rat(11, 13)];

  it('starts with B_0(x) = 1, B_1(x) = x − 1/2, B_2(x) = x² − x + 1/6', () => {
    for (const x of points) {
      // (common practice, no source): the first Bernoulli polynomials.
      expect(show(bernoulliPolynomial(0, x))).toBe('1');
      expect(show(bernoulliPolynomial(1, x))).toBe(show(rsub(x, rat(1, 2))));
      expect(show(bernoulliPolynomial(2, x))).toBe(show(radd(rsub(rmul(x, x), x), rat(1, 6))));
    }
  });

  it('satisfies B_n(x+1) − B_n(x) = n x^{n−1} and B_n(1−x) = (−1)^n B_n(x)', () => {
    // Ireland–Rosen, ch. 15, §1: both follow from the generating function t e^{xt}/(e^t − 1).
    for (let n = 1; n <= 16; n++) {
      for (const x of points) {
        const difference = rsub(bernoulliPolynomial(n, radd(x, rat(1))), bernoulliPolynomial(n, x));
        expect(show(difference), `n = ${n}, x = ${show(x)}`).toBe(show(rmul(rat(n), rpow(x, n - 1))));
        const reflected = bernoulliPolynomial(n, rsub(rat(1), x));
        const expected = n % 2 === 0 ? bernoulliPolynomial(n, x) : rneg(bernoulliPolynomial(n, x));
        expect(req(reflected, expected), `reflection n = ${n}, x = ${show(x)}`).toBe(true);
      }
    }
  });

  it('sums powers: Σ_{a<m} a^n = (B_{n+1}(m) − B_{n+1})/(n+1) (Faulhaber)', () => {
    // Ireland–Rosen, ch. 15, §1; the left side is summed directly.
    for (let n = 0; n <= 12; n++) {
      for (let m = 1; m <= 25; m++) {
        let direct = int(0);
        for (let a = 0; a < m; a++) direct = JSBI.add(direct, JSBI.exponentiate(int(a), int(n)));
        const viaBernoulli = rdiv(rsub(bernoulliPolynomial(n + 1, rat(m)), bernoulli(n + 1)), rat(n + 1));
        expect(show(viaBernoulli), `n = ${n}, m = ${m}`).toBe(direct.toString());
      }
    }
  });

  it('lists its coefficients from x^0 upwards', () => {
    const c = bernoulliPolynomialCoefficients(3); // B_3(x) = x³ − (3/2)x² + (1/2)x (common practice, no source)
    expect(c.map(show)).toEqual(['0', '1/2', '-3/2', '1']);
    expect(show(bernoulliPolynomial(3, RZERO))).toBe('0');
  });
});
