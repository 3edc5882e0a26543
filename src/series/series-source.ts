/**
 * Precision planning. A `SeriesSource` is a series that can be expanded to any
 * q-order on demand, with a lower bound for its valuation known in advance. The
 * combinators below ask each input for exactly the order the output needs:
 * - a product to order X needs factor i to X − Σ_{j≠i} v_j (v_j lower bounds);
 * - f^k needs f to X − (k−1)·v(f) (Miller's recurrence, or k−1 multiplications);
 * - F/T (exact slice division, T of known valuation v_T) needs F to X + v_T and T
 *   to X + v_T − v(F/T).
 * Asking for more recomputes from the sources; nothing is ever padded with zeros.
 */
import { type Rational, radd, rsub, rmul, rmin, rat, rcmp } from './rational.js';
import { type QZSeries, truncateSeries, zeroSeries } from './qz-series.js';
import { multiplySeries } from './multiply.js';
import { powerSeries } from './power.js';
import { linearCombination } from './add.js';
import { divideExact } from './divide-exact.js';
import { substituteLinear } from './substitute.js';
import { type ModularView, exactView, cachedView, lastOrder } from './residue/modular-view.js';
import { majorantOfIntegers, residuesOfIntegers } from './residue/integer-grid.js';
import { powerIntegers } from './residue/integer-multiply.js';
import { productView } from './residue/product-view.js';
import { majorantPower, majorantSum, zeroMajorant } from './residue/majorant.js';
import { zeroResidues } from './residue/residue-series.js';
import { powerResidues, powerSpectrum } from './residue/residue-power.js';
import { combineResidues, type WeightedResidues } from './residue/residue-combine.js';
import { type WeightedSpectrum, sameSpectrumGrid, sumOfSpectra } from './residue/residue-spectrum.js';
import type { NttPrime } from './modular/ntt-primes.js';

export interface SeriesSource {
  /** A lower bound of the valuation; exact where the source says so. */
  readonly valuation: Rational;
  /** The series to q-order X (exact to at least X; callers truncate). */
  expand(X: Rational): QZSeries;
  /** Its own modular route, if it has one (else `modularOf` goes through `expand`). */
  readonly modular?: ModularView;
}

/** The source's modular view: its own, or the exact engine's. */
export function modularOf(s: SeriesSource): ModularView {
  if (s.modular !== undefined) return s.modular;
  let v = exactViews.get(s);
  if (v === undefined) {
    v = exactView(s);
    exactViews.set(s, v);
  }
  return v;
}

const exactViews = new WeakMap<SeriesSource, ModularView>();

/** Wraps a builder `X ↦ series to X`. */
export function source(valuation: Rational, build: (X: Rational) => QZSeries): SeriesSource {
  return { valuation, expand: (X) => build(X) };
}

/** Memoises the highest expansion made so far; smaller orders are truncations of it. */
export function cached(s: SeriesSource): SeriesSource {
  let best: QZSeries | null = null;
  return {
    valuation: s.valuation,
    ...(s.modular ? { modular: cachedView(s.modular) } : {}),
    expand(X: Rational): QZSeries {
      if (best === null || rcmp(best.exactTo, X) < 0) best = s.expand(X);
      return rcmp(best.exactTo, X) === 0 ? best : truncateSeries(best, X);
    },
  };
}

export function productSource(factors: readonly SeriesSource[]): SeriesSource {
  let v = rat(0);
  for (const f of factors) v = radd(v, f.valuation);
  return {
    valuation: v,
    expand(X: Rational): QZSeries {
      if (rcmp(X, v) < 0) return zeroSeries(X, v);
      let acc: QZSeries | null = null;
      for (const f of factors) {
        const part = f.expand(radd(X, rsub(f.valuation, v)));
        acc = acc === null ? part : multiplySeries(acc, part);
      }
      return truncateSeries(acc!, X);
    },
    modular: productViewOf(factors, v),
  };
}

/** A product's modular view (residue/product-view.ts) over its factors' views. */
function productViewOf(factors: readonly SeriesSource[], v: Rational): ModularView {
  return productView(
    factors.map((f) => ({ view: modularOf(f), valuation: f.valuation, count: 1 })),
    v,
  );
}

export function powerSource(base: SeriesSource, k: number): SeriesSource {
  const v = rmul(base.valuation, rat(k));
  return {
    valuation: v,
    expand(X: Rational): QZSeries {
      if (k > 0 && rcmp(X, v) < 0) return zeroSeries(X, v);
      const need = rsub(X, rmul(base.valuation, rat(k - 1)));
      return truncateSeries(powerSeries(base.expand(need), k), X);
    },
    ...modularPower(base, k, v),
  };
}

/**
 * f^k for k ≥ 1 by the rules of majorants; for k ≤ 0 only where the base knows its
 * own powers (η), since an inverse has no majorant by the rules (MATH.md §8).
 */
function modularPower(base: SeriesSource, k: number, v: Rational): { modular?: ModularView } {
  const own = base.modular?.power?.(k);
  if (own !== undefined) return { modular: own };
  if (k < 1) return {};
  const need = (X: Rational): Rational => rsub(X, rmul(base.valuation, rat(k - 1)));
  const view = modularOf(base);
  const ints = view.integers
    ? lastOrder((X: Rational) => {
        if (rcmp(X, v) < 0) return null;
        const g = view.integers!(need(X));
        return g === null ? null : powerIntegers(g, k, X);
      })
    : undefined;
  return {
    modular: {
      majorant(X, h) {
        if (rcmp(X, v) < 0) return zeroMajorant(h);
        const g = ints?.(X);
        if (g) return majorantOfIntegers(g, X, h);
        return majorantPower(view.majorant(need(X), h), k, base.valuation, X);
      },
      residues(X, primes) {
        if (rcmp(X, v) < 0) return zeroResidues(primes, v, 1, X);
        const g = ints?.(X);
        if (g) return residuesOfIntegers(g, primes);
        return powerResidues(view.residues(need(X), primes), k, X);
      },
      spectrum(X, primes) {
        if (rcmp(X, v) < 0 || ints?.(X)) return null;
        return powerSpectrum(view.residues(need(X), primes), k, X);
      },
      ...(ints ? { integers: ints, leaves: [{ view, valuation: base.valuation, count: k }] } : {}),
    },
  };
}

export interface WeightedSource {
  readonly source: SeriesSource;
  readonly coefficient: Rational;
}

export function sumSource(terms: readonly WeightedSource[]): SeriesSource {
  let v = terms[0]!.source.valuation;
  for (const t of terms) v = rmin(v, t.source.valuation);
  return {
    valuation: v,
    expand(X: Rational): QZSeries {
      return linearCombination(terms.map((t) => ({ series: t.source.expand(X), coefficient: t.coefficient })));
    },
    modular: {
      majorant: (X, h) => majorantSum(terms.map((t) => ({ majorant: modularOf(t.source).majorant(X, h), coefficient: t.coefficient })), h),
      residues: (X, primes) => combineResidues(fuseSpectra(terms, X, primes), primes),
    },
  };
}

/**
 * The terms' residues, those of the terms still in the transform domain with one grid
 * first added there and brought back by a single inverse transform (residue-spectrum.ts).
 */
function fuseSpectra(terms: readonly WeightedSource[], X: Rational, primes: readonly NttPrime[]): WeightedResidues[] {
  const out: WeightedResidues[] = [];
  const group: WeightedSpectrum[] = [];
  for (const t of terms) {
    const view = modularOf(t.source);
    const s = view.spectrum?.(X, primes) ?? null;
    if (s === null) out.push({ series: view.residues(X, primes), coefficient: t.coefficient });
    else if (group.length === 0 || sameSpectrumGrid(group[0]!.spectrum, s)) group.push({ spectrum: s, coefficient: t.coefficient });
    else out.push({ series: sumOfSpectra([{ spectrum: s, coefficient: rat(1) }]), coefficient: t.coefficient });
  }
  if (group.length > 0) out.unshift({ series: sumOfSpectra(group), coefficient: rat(1) });
  return out;
}

/** c·f. */
export function scaledSource(s: SeriesSource, c: Rational): SeriesSource {
  return sumSource([{ source: s, coefficient: c }]);
}

/** Applies a map that preserves q-orders (D_q, D_ζ, ζ ↦ ζ^a, scaling). */
export function mapSource(s: SeriesSource, f: (x: QZSeries) => QZSeries, valuation = s.valuation): SeriesSource {
  return { valuation, expand: (X) => f(s.expand(X)) };
}

/**
 * F/T by exact slice division; `divisorValuation` must be T's exact valuation.
 * `onFailure` turns a non-exact division (a pole) into the caller's error.
 */
export function quotientSource(
  F: SeriesSource,
  T: SeriesSource,
  divisorValuation: Rational,
  onFailure: () => never,
): SeriesSource {
  const vG = rsub(F.valuation, divisorValuation);
  return {
    valuation: vG,
    expand(X: Rational): QZSeries {
      const g = divideExact(F.expand(radd(X, divisorValuation)), T.expand(radd(rsub(X, vG), divisorValuation)));
      if (g === null) onFailure();
      return truncateSeries(g, X);
    },
  };
}

/** A series in one variable with no ζ-terms (a q-series) seen as a series in n variables. */
export function liftQSeries(s: SeriesSource, n: number): SeriesSource {
  if (n === 1) return s;
  const zero = [new Array<number>(n).fill(0)];
  return mapSource(s, (x) => substituteLinear(x, zero));
}
