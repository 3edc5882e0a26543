/**
 * Evaluates what follows `^` to an integer. Exponents are integers (CLAIMS.md), but
 * written ones may be `-6`, `(-6)`, `{18}` or a power such as `2^3` (that is how
 * `a^b^c` can be meaningful), so a small integer evaluator is needed.
 */
import type { SyntaxExpr } from './syntax-tree.js';

export type ExponentValue =
  | { readonly ok: true; readonly value: bigint }
  | { readonly ok: false; readonly reason: 'notInteger' | 'tooLarge'; readonly at: SyntaxExpr };

/** Limits that keep evaluation instant; exponents this large mean a typo anyway. */
const MAX_INNER_EXPONENT = 4096n;
const MAX_BITS = 65536;

export function integerExponent(expr: SyntaxExpr): ExponentValue {
  switch (expr.kind) {
    case 'number':
      return { ok: true, value: BigInt(expr.value) };
    case 'paren':
      return integerExponent(expr.inner);
    case 'neg': {
      const operand = integerExponent(expr.operand);
      return operand.ok ? { ok: true, value: -operand.value } : operand;
    }
    case 'binary':
      return binaryExponent(expr);
    case 'power':
      return powerExponent(expr);
    default:
      return { ok: false, reason: 'notInteger', at: expr };
  }
}

function binaryExponent(expr: Extract<SyntaxExpr, { kind: 'binary' }>): ExponentValue {
  if (expr.op === '/') return { ok: false, reason: 'notInteger', at: expr };
  const left = integerExponent(expr.left);
  if (!left.ok) return left;
  const right = integerExponent(expr.right);
  if (!right.ok) return right;
  const value =
    expr.op === '+' ? left.value + right.value : expr.op === '-' ? left.value - right.value : left.value * right.value;
  return withinLimits(value, expr);
}

function powerExponent(expr: Extract<SyntaxExpr, { kind: 'power' }>): ExponentValue {
  const base = integerExponent(expr.base);
  if (!base.ok) return base;
  const exponent = BigInt(expr.exponent);
  // A negative power of an integer other than ±1 is not an integer.
  if (exponent < 0n && base.value !== 1n && base.value !== -1n) return { ok: false, reason: 'notInteger', at: expr };
  if (exponent > MAX_INNER_EXPONENT && base.value !== 0n && base.value !== 1n && base.value !== -1n) {
    return { ok: false, reason: 'tooLarge', at: expr };
  }
  const magnitude = exponent < 0n ? -exponent : exponent;
  return withinLimits(base.value ** magnitude, expr);
}

function withinLimits(value: bigint, at: SyntaxExpr): ExponentValue {
  const bits = (value < 0n ? -value : value).toString(2).length;
  return bits > MAX_BITS ? { ok: false, reason: 'tooLarge', at } : { ok: true, value };
}
