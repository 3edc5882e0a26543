/**
 * Series sources for the parts of a monomial: the numerator (coefficient, units,
 * theta block by exact slice division, numerator factors) and the denominator.
 */
import {
  type SeriesSource,
  type Rational,
  rat,
  radd,
  rmul,
  productSource,
  powerSource,
  quotientSource,
  mapSource,
  scaleSeries,
  constantSeries,
  source,
  req,
} from '../series/index.js';
import type { AtomPower, Monomial } from './atom.js';
import { type MonomialParts, splitMonomial } from './monomial-parts.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

function powersSource(powers: readonly AtomPower[]): SeriesSource | null {
  if (powers.length === 0) return null;
  const parts = powers.map((p) => (p.exponent === 1 ? p.atom.source : powerSource(p.atom.source, p.exponent)));
  return parts.length === 1 ? parts[0]! : productSource(parts);
}

/** Π ϑ(a_i z)^{e_i} with some e_i < 0, holomorphic by the divisor rule. */
export function thetaBlockSource(block: readonly AtomPower[]): SeriesSource {
  const num = powersSource(block.filter((p) => p.exponent > 0));
  const den = powersSource(block.filter((p) => p.exponent < 0).map((p) => ({ atom: p.atom, exponent: -p.exponent })))!;
  let vDen: Rational = rat(0);
  for (const p of block) if (p.exponent < 0) vDen = radd(vDen, rmul(p.atom.source.valuation, rat(-p.exponent)));
  const numerator = num ?? source(rat(0), (X) => constantSeries(rat(1), X));
  return quotientSource(numerator, den, vDen, () => {
    throw evalError(evalCodes.internal, { detail: 'a theta block passed the divisor rule but did not divide exactly' }, null);
  });
}

export function numeratorSource(m: Monomial, parts: MonomialParts = splitMonomial(m)): SeriesSource {
  const pieces: SeriesSource[] = [];
  const units = powersSource(parts.units);
  if (units) pieces.push(units);
  if (parts.thetaBlock.length > 0) pieces.push(thetaBlockSource(parts.thetaBlock));
  const num = powersSource(parts.numerator);
  if (num) pieces.push(num);
  const c = m.coefficient;
  if (pieces.length === 0) return source(rat(0), (X) => constantSeries(c, X));
  const body = pieces.length === 1 ? pieces[0]! : productSource(pieces);
  return req(c, rat(1)) ? body : mapSource(body, (s) => scaleSeries(s, c));
}

/** The product of the divisors (null when there are none). */
export function denominatorSource(parts: MonomialParts): SeriesSource | null {
  return powersSource(parts.denominator);
}
