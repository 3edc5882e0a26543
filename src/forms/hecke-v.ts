/**
 * The index-raising Hecke operator V_l (Eichler–Zagier 1985, §4, (2); MATH.md §7):
 *   c′(n, r) = Σ_{a | (n, r, l)} a^{k−1} c(nl/a², r/a),   J_{k,m} → J_{k,ml}.
 * Read from the input side: an input term (n₀, r₀) contributes a^{k−1}c(n₀, r₀) to
 * (n₀a²/l, r₀a) for every a | l with (l/a) | n₀. So an output to q-order X needs the
 * input to l·X (a = 1), and the output may start below the input: at ⌈x₀/l⌉ for
 * x₀ ≥ 0 and at l·x₀ for x₀ < 0. Needs trivial multiplier (integral q-exponents) and
 * integral weight and index; for weak forms the a-sum includes the q⁰ terms as written.
 */
import {
  type SeriesSource,
  type QZSeries,
  type Rational,
  JSBI,
  ONE,

  rat,
  rmul,
  rpow,
  rfloor,
  rcmp,
  toNumber,
  isZero,
  makeSeries,
  dense,
  slicesFromRationalRows,
  sliceCountTo,
  sliceExponent,
  zeroSeries,
} from '../series/index.js';
import { divisors } from './divisor-sums.js';

/** Lowest possible output exponent for an input starting at x₀ (integral). */
export function heckeVStart(x0: number, l: number): number {
  return x0 >= 0 ? Math.floor(x0 / l) : l * x0;
}

function addTerm(rows: Map<number, Map<number, Rational>>, n: number, halves: number, v: Rational): void {
  let row = rows.get(n);
  if (row === undefined) rows.set(n, (row = new Map()));
  const prev = row.get(halves);
  row.set(halves, prev === undefined ? v : { num: JSBI.add(JSBI.multiply(prev.num, v.den), JSBI.multiply(v.num, prev.den)), den: JSBI.multiply(prev.den, v.den) });
}

/** V_l applied to a series with integral q-exponents, to q-order X. */
export function heckeV(f: QZSeries, k: number, l: number, X: Rational): QZSeries {
  const x0 = toNumber(rfloor(f.start));
  const start = heckeVStart(x0, l);
  const n = sliceCountTo(rat(start), 1, X);
  if (n === 0) return zeroSeries(X, rat(start));
  const rows = new Map<number, Map<number, Rational>>();
  for (const a of divisors(l)) {
    const weight = rpow(rat(a), k - 1);
    for (let i = 0; i < f.slices.length; i++) {
      const x = sliceExponent(f, i);
      if (!JSBI.equal(x.den, ONE)) throw new RangeError('internal: V_l needs integral q-exponents');
      const n0 = toNumber(x.num);
      if (n0 % (l / a) !== 0) continue;
      const nOut = (n0 * a * a) / l;
      if (nOut - start >= n) continue;
      const sl = dense(f.slices[i]!);
      sl.c.forEach((v, j) => {
        if (!isZero(v)) addTerm(rows, nOut, (sl.lo + j) * a, rmul(weight, { num: v, den: f.den }));
      });
    }
  }
  return collect(rows, start, n, X, f.nvars);
}

function collect(rows: Map<number, Map<number, Rational>>, start: number, n: number, X: Rational, nvars: number): QZSeries {
  const ordered: Map<number, Rational>[] = Array.from({ length: n }, (_, i) => rows.get(start + i) ?? new Map<number, Rational>());
  const { den, slices } = slicesFromRationalRows(ordered);
  return makeSeries(rat(start), 1, den, slices, X, nvars);
}

export function heckeVSource(f: SeriesSource, k: number, l: number): SeriesSource {
  const x0 = toNumber(rfloor(f.valuation));
  return {
    valuation: rat(heckeVStart(x0, l)),
    expand(X: Rational): QZSeries {
      // c′(n, ·) with n ≤ X reads c(nl/a², ·): at most X·l for X ≥ 0 (a = 1), X/l for X < 0 (a = l).
      const need = rcmp(X, rat(0)) >= 0 ? rmul(X, rat(l)) : rmul(X, rat(1, l));
      return heckeV(f.expand(rcmp(need, f.valuation) < 0 ? f.valuation : need), k, l, X);
    },
  };
}

