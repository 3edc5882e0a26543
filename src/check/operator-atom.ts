/**
 * Operators as atoms (MATH.md §5, §7): each gives its stated type only to input of
 * class modular with a proven type; on quasi input its output is quasi. Inputs with a
 * non-unit divisor are refused (op(N/Q) ≠ op(N)/Q). Failed preconditions are errors
 * naming the condition.
 */
import { type Rational, type SeriesSource, rat, radd, rmul, rIsInteger, toNumber, req, rationalToString } from '../series/index.js';
import type { Span } from '../lang/span.js';
import { type ModularType, typeProduct, scalarIndexOf, scalarIndex, indexIsZero, formatType, matrixInverse } from '../types/index.js';
import { serreSource, heatSource, rankinCohenSource } from '../forms/differential-operators.js';
import { taylorSource } from '../forms/taylor-coefficient.js';
import { heckeVSource } from '../forms/hecke-v.js';
import { heckeTSource } from '../forms/hecke-t.js';
import { isPrime } from '../forms/divisor-sums.js';
import type { Atom, Monomial } from './atom.js';
import { atomMonomial, isZeroMonomial, monomialText, ZERO_MONOMIAL } from './monomial.js';
import { splitMonomial, monomialType, monomialClass, quasiReasons } from './monomial-parts.js';
import { numeratorSource } from './monomial-source.js';
import { substitutedAtom } from './substituted-atom.js';
import { evalCodes } from './diagnostic-codes.js';
import { evalError } from './eval-error.js';

export type OperatorName = 'serre' | 'heat' | 'taylor' | 'bracket' | 'V' | 'T';

interface Input {
  readonly m: Monomial;
  readonly type: ModularType;
  readonly source: SeriesSource;
  readonly quasi: boolean;
  readonly reasons: readonly string[];
}

function input(op: string, m: Monomial, nvars: number, span: Span | null): Input {
  const den = splitMonomial(m).denominator;
  if (den.length > 0) {
    throw evalError(evalCodes.meromorphicInput, { what: op, denominator: den.map((p) => p.atom.key).join('*') }, span);
  }
  const quasi = monomialClass(m) === 'quasi';
  return { m, type: monomialType(m, nvars)!, source: numeratorSource(m), quasi, reasons: quasiReasons(m) };
}

function precondition(ok: boolean, op: string, condition: string, t: ModularType, span: Span | null): void {
  if (!ok) throw evalError(evalCodes.operatorPrecondition, { op, condition, type: formatType(t) }, span);
}

function operatorAtom(key: string, type: ModularType, inputs: readonly Input[], source: SeriesSource, opName: string): Monomial {
  const quasi = inputs.some((i) => i.quasi);
  const reasons = inputs.flatMap((i) => i.reasons);
  const atom: Atom = {
    key,
    kind: 'other',
    type,
    cls: quasi ? 'quasi' : 'modular',
    quasiReason: quasi ? [`${opName} of a quasi-modular input has no proven type`, ...reasons].join('; ') : null,
    source,
    valuationExact: false,
    thetaL: null,
    substitute: (A: readonly (readonly number[])[]): Monomial => atomMonomial(substitutedAtom(atom, A)),
  };
  return atomMonomial(atom);
}

function integral(r: Rational): boolean {
  return rIsInteger(r);
}

export function serreMonomial(m: Monomial, nvars: number, span: Span | null): Monomial {
  if (isZeroMonomial(m)) return ZERO_MONOMIAL;
  const f = input('serre', m, nvars, span);
  precondition(indexIsZero(f.type.index), 'serre', 'index 0', f.type, span);
  const type = { ...f.type, weight: radd(f.type.weight, rat(2)) };
  return operatorAtom(`serre(${monomialText(m)})`, type, [f], serreSource(f.source, f.type.weight, nvars), 'serre');
}

export function heatMonomial(m: Monomial, nvars: number, span: Span | null): Monomial {
  if (isZeroMonomial(m)) return ZERO_MONOMIAL;
  const f = input('heat', m, nvars, span);
  // MATH.md §5: the heat operator needs an invertible index (on index 0 use serre)
  const inv = indexIsZero(f.type.index) ? null : matrixInverse(f.type.index);
  precondition(inv !== null, 'heat', nvars === 1 ? 'a non-zero index (use serre on index 0)' : 'an invertible index matrix', f.type, span);
  const type = { ...f.type, weight: radd(f.type.weight, rat(2)) };
  return operatorAtom(`heat(${monomialText(m)})`, type, [f], heatSource(f.source, f.type.weight, inv!), 'heat');
}

export function taylorMonomial(m: Monomial, nu: number, nvars: number, span: Span | null): Monomial {
  if (isZeroMonomial(m)) return ZERO_MONOMIAL;
  const f = input('taylor', m, nvars, span);
  precondition(nvars === 1, 'taylor', 'one variable', f.type, span);
  const type: ModularType = { weight: radd(f.type.weight, rat(nu)), index: scalarIndex(rat(0)), etaPower: f.type.etaPower };
  return operatorAtom(`taylor(${monomialText(m)}, ${nu})`, type, [f], taylorSource(f.source, scalarIndexOf(f.type), nu), 'taylor');
}

export function bracketMonomial(a: Monomial, b: Monomial, n: number, nvars: number, span: Span | null): Monomial {
  if (isZeroMonomial(a) || isZeroMonomial(b)) return ZERO_MONOMIAL;
  const f = input('[f, g]_n', a, nvars, span);
  const g = input('[f, g]_n', b, nvars, span);
  precondition(indexIsZero(f.type.index), '[f, g]_n', 'index 0 for f', f.type, span);
  precondition(indexIsZero(g.type.index), '[f, g]_n', 'index 0 for g', g.type, span);
  const prod = typeProduct(f.type, g.type);
  const type = { ...prod, weight: radd(prod.weight, rat(2 * n)) };
  const key = `[${monomialText(a)}, ${monomialText(b)}]_${n}`;
  return operatorAtom(key, type, [f, g], rankinCohenSource(f.source, f.type.weight, g.source, g.type.weight, n), `[f, g]_${n}`);
}

function heckePreconditions(op: string, t: ModularType, nvars: number, span: Span | null): void {
  precondition(nvars === 1, op, 'one variable', t, span);
  precondition(t.etaPower === 0, op, 'trivial multiplier', t, span);
  precondition(integral(t.weight), op, 'integral weight', t, span);
  precondition(integral(scalarIndexOf(t)), op, 'integral index', t, span);
}

export function heckeVMonomial(m: Monomial, l: number, nvars: number, span: Span | null): Monomial {
  if (isZeroMonomial(m)) return ZERO_MONOMIAL;
  const f = input(`V_${l}`, m, nvars, span);
  heckePreconditions(`V_${l}`, f.type, nvars, span);
  precondition(l >= 1, `V_${l}`, 'l ≥ 1', f.type, span);
  const type: ModularType = { ...f.type, index: scalarIndex(rmul(scalarIndexOf(f.type), rat(l))) };
  const k = toNumber(f.type.weight.num);
  return operatorAtom(`V_${l}(${monomialText(m)})`, type, [f], heckeVSource(f.source, k, l), `V_${l}`);
}

export function heckeTMonomial(m: Monomial, p: number, nvars: number, span: Span | null): Monomial {
  if (isZeroMonomial(m)) return ZERO_MONOMIAL;
  const f = input(`T_${p}`, m, nvars, span);
  heckePreconditions(`T_${p}`, f.type, nvars, span);
  precondition(isPrime(p), `T_${p}`, 'p prime', f.type, span);
  const index = scalarIndexOf(f.type);
  if (!req(index, rat(1))) {
    throw evalError(evalCodes.notYetSupported, { what: `T_${p} on index ${rationalToString(index)} (only index 1 has a published formula built in)` }, span);
  }
  const k = toNumber(f.type.weight.num);
  return operatorAtom(`T_${p}(${monomialText(m)})`, f.type, [f], heckeTSource(f.source, k, p), `T_${p}`);
}
