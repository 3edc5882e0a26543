/**
 * Sums of powers in the transform domain. E_4³ − E_6² by itself takes two forward and
 * two inverse transforms per prime; since the transform is linear, the two powers can
 * be combined pointwise before one inverse: three transforms instead of four. A
 * `Spectrum` is a q-only power still in the transform domain: the forward transform
 * (length n, ntt.ts order) of its untruncated coefficients, which fit in n, so the
 * inverse of any linear combination of spectra of one length, start and row count gives
 * the combination's coefficients (residue-power.ts, powerSpectrum).
 */
import { type Rational, rcmp } from '../rational.js';
import { mulmod, invmod } from '../modular/mulmod.js';
import { nttInverse } from '../modular/ntt.js';
import type { NttPrime } from '../modular/ntt-primes.js';
import { type ResidueSeries, rationalResidue } from './residue-series.js';

export interface Spectrum {
  readonly primes: readonly NttPrime[];
  readonly start: Rational;
  readonly qDen: number;
  readonly rows: number;
  readonly exactTo: Rational;
  /** The transform length; one array of n residues per prime, not yet divided by n. */
  readonly n: number;
  readonly data: readonly Int32Array[];
}

export interface WeightedSpectrum {
  readonly spectrum: Spectrum;
  readonly coefficient: Rational;
}

/** Whether two spectra can be added pointwise: same primes, length, grid and rows. */
export function sameSpectrumGrid(a: Spectrum, b: Spectrum): boolean {
  return a.primes === b.primes && a.n === b.n && a.qDen === b.qDen && a.rows === b.rows && rcmp(a.start, b.start) === 0 && rcmp(a.exactTo, b.exactTo) === 0;
}

/** Σ aᵢ·sᵢ back to coefficients by one inverse transform per prime (the spectra on one grid). */
export function sumOfSpectra(terms: readonly WeightedSpectrum[]): ResidueSeries {
  const first = terms[0]!.spectrum;
  const { primes, n, qDen, rows, start, exactTo } = first;
  const data = primes.map((prime, pi) => {
    const { p } = prime;
    const pinv = 1 / p;
    const ninv = invmod(n % p, p);
    const t = new Int32Array(n);
    for (const { spectrum, coefficient } of terms) {
      const c = mulmod(rationalResidue(coefficient, p), ninv, p, pinv);
      const s = spectrum.data[pi]!;
      for (let i = 0; i < n; i++) {
        const v = t[i]! + mulmod(c, s[i]!, p, pinv);
        t[i] = v >= p ? v - p : v;
      }
    }
    nttInverse(t, prime, true);
    return t.slice(0, rows);
  });
  return { primes, start, qDen, rows, exactTo, zLo: 0, zStep: 1, width: 1, data };
}
