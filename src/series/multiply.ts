/**
 * The multiplication dispatcher. Costs are counted in JSBI coefficient products:
 * sparse × dense costs nnz(a)·nnz(b) restricted to the output range; Kronecker +
 * Karatsuba costs about L^1.585 for the packed length L but ignores sparsity.
 * SPARSE_RATIO and KRONECKER_MIN_PRODUCTS were set on this machine by timing the
 * three algorithms on theta/eta leaves and on dense weak Jacobi forms (test/series
 * checks all three against schoolbook; bench/ records the workloads).
 */
import type { QZSeries } from './qz-series.js';
import { mulSchoolbook } from './mul-schoolbook.js';
import { mulSparseDense, nonZeroTerms } from './mul-sparse-dense.js';
import { mulKronecker } from './mul-kronecker.js';
import { planProduct } from './product-plan.js';

/** A factor counts as sparse when it has at most this fraction of the other's terms. */
export const SPARSE_RATIO = 1 / 8;
/** Below this many schoolbook products the Kronecker packing does not pay. */
export const KRONECKER_MIN_PRODUCTS = 40_000;

export type MulAlgorithm = 'schoolbook' | 'sparse-dense' | 'kronecker';

export function chooseMulAlgorithm(x: QZSeries, y: QZSeries): { algorithm: MulAlgorithm; sparseFirst: boolean } {
  const { count } = planProduct(x, y);
  const nx = nonZeroTerms(x, count);
  const ny = nonZeroTerms(y, count);
  if (nx === 0 || ny === 0) return { algorithm: 'schoolbook', sparseFirst: true };
  if (nx <= ny * SPARSE_RATIO) return { algorithm: 'sparse-dense', sparseFirst: true };
  if (ny <= nx * SPARSE_RATIO) return { algorithm: 'sparse-dense', sparseFirst: false };
  if (nx * ny < KRONECKER_MIN_PRODUCTS) return { algorithm: 'schoolbook', sparseFirst: true };
  return { algorithm: 'kronecker', sparseFirst: true };
}

export function multiplySeries(x: QZSeries, y: QZSeries): QZSeries {
  if (x.nvars !== y.nvars) throw new RangeError('internal: multiplying series in different variables');
  // Several variables: sparse slices, whose products are the schoolbook ones.
  if (x.nvars > 1) return mulSchoolbook(x, y);
  const { algorithm, sparseFirst } = chooseMulAlgorithm(x, y);
  switch (algorithm) {
    case 'sparse-dense':
      return sparseFirst ? mulSparseDense(x, y) : mulSparseDense(y, x);
    case 'kronecker':
      return mulKronecker(x, y);
    case 'schoolbook':
      return mulSchoolbook(x, y);
  }
}
