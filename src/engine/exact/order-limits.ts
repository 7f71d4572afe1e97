import type { Rational } from './rational.ts';
import type { RationalFunction } from './rational-function.ts';

/** The limits of an apparent order ∂ln f/∂ln x: `low` as x → 0, `high` as x → ∞. */
export interface OrderLimits {
  readonly low: Rational;
  readonly high: Rational;
}

/**
 * The limiting orders of f = a/b in a symbol: as x → 0 the lowest power of x dominates each side,
 * so the order tends to lowDegree(a) − lowDegree(b); as x → ∞ the highest does, giving
 * degree(a) − degree(b). A symbol absent from both sides has order 0 at both ends (every term
 * counts as x⁰). This assumes the coefficients of those extreme powers do not vanish at the values
 * of the other symbols — always so when they are positive constants and concentrations.
 * Undefined for the zero function, which has no order.
 */
export function orderLimits(f: RationalFunction, symbol: string): OrderLimits | undefined {
  if (f.isZero()) return undefined;
  const [a, b] = [f.numerator, f.denominator];
  return {
    low: a.lowDegreeIn(symbol).sub(b.lowDegreeIn(symbol)),
    high: a.degreeIn(symbol).sub(b.degreeIn(symbol)),
  };
}
