/**
 * Reaction orders: the limits of ∂ln r/∂ln[X] as [X] → 0 and [X] → ∞ from the polynomial
 * degrees (for a law with radicals, from the Newton polygons of its roots), and the apparent
 * order at given conditions from the exact logarithmic derivative. A conserved catalyst's order
 * is in its total concentration.
 */
import { AlgebraicFunction, algebraicOrderLimits, orderLimits, Polynomial, RationalFunction } from '../exact/index.ts';
import type { RateLawContext } from './context.ts';
import type { OrderRange } from './rate-law.ts';
import { concentration } from './symbols.ts';

/** The species whose order a rate law has, each with the symbol the order is taken in. */
export function orderSymbols(context: RateLawContext): { species: string; symbol: string }[] {
  const totals = new Map(context.conservations.map((c) => [c.catalyst, c.total]));
  return [...context.mechanism.species.keys()]
    .filter((sp) => totals.has(sp) || (!context.internal.includes(sp) && !context.solvents.includes(sp)))
    .map((species) => ({ species, symbol: totals.get(species) ?? concentration(species) }));
}

/** An exact rate law: a rational function, or a law with radicals. */
export type RateExpression = RationalFunction | AlgebraicFunction;

/** Order limits of every species in an exact rate law. */
export function orderLimitsOf(
  expression: RateExpression,
  symbols: readonly { species: string; symbol: string }[],
): Map<string, OrderRange> {
  const out = new Map<string, OrderRange>();
  for (const { species, symbol } of symbols) {
    const limits =
      expression instanceof AlgebraicFunction
        ? algebraicOrderLimits(expression, symbol)
        : orderLimits(expression, symbol);
    if (limits) out.set(species, { low: limits.low, high: limits.high });
  }
  return out;
}

/**
 * The apparent order x ∂ln r/∂x at the given values; at x = 0 it is the low limit. Undefined
 * when a symbol has no value or the rate vanishes there.
 */
export function apparentOrder(
  expression: RateExpression,
  symbol: string,
  values: ReadonlyMap<string, number>,
  low?: number,
): number | undefined {
  if (!expression.symbols().every((s) => values.has(s))) return undefined;
  if (values.get(symbol) === 0) return low;
  if (expression instanceof AlgebraicFunction) {
    // A species at zero (a product at initial rates) is taken out first, its roots solved again without it.
    const absent = expression.symbols().filter((s) => s !== symbol && values.get(s) === 0);
    return withAbsent(expression, absent).logDerivative(symbol, values);
  }
  const derivative = expression.logDerivative(symbol);
  if (!derivative) return undefined;
  const order = derivative.evaluate(values);
  return Number.isFinite(order) ? order : undefined;
}

/**
 * The law with some concentrations at zero (products at initial rates), where that leaves a
 * finite, non-zero rate; a species whose absence would make the rate vanish or diverge (a
 * product in an inverse order) stays, since the law then presumes it present.
 */
export function withAbsent<E extends RateExpression>(expression: E, symbols: readonly string[]): E {
  if (expression instanceof AlgebraicFunction) {
    let f: AlgebraicFunction = expression;
    for (const symbol of symbols) if (f.symbols().includes(symbol)) f = f.withZero(symbol) ?? f;
    return f as E;
  }
  let out: RationalFunction = expression as RationalFunction;
  for (const symbol of symbols) {
    if (!out.symbols().includes(symbol)) continue;
    // A fractional power of an absent species has no value at zero: the law presumes it present.
    const powers = [...out.numerator.terms, ...out.denominator.terms].map((t) => t.monomial.exponent(symbol));
    if (!powers.every((e) => e.isInteger() && e.sign() >= 0)) continue;
    const numerator = out.numerator.substitute(symbol, Polynomial.ZERO);
    const denominator = out.denominator.substitute(symbol, Polynomial.ZERO);
    if (!numerator.isZero() && !denominator.isZero()) out = RationalFunction.of(numerator, denominator);
  }
  return out as E;
}

/** The value at the given values, where every symbol has one; undefined otherwise or where it is not finite. */
export function rateValue(expression: RateExpression, values: ReadonlyMap<string, number>): number | undefined {
  if (!expression.symbols().every((s) => values.has(s))) return undefined;
  const r = expression.evaluate(values);
  return Number.isFinite(r) ? r : undefined;
}

/** True when every term of the numerator is positive: no difference of forward and reverse rates. */
export function hasPositiveNumerator(expression: RateExpression): boolean {
  const numerator = expression instanceof AlgebraicFunction ? expression.outer.numerator : expression.numerator;
  return numerator.terms.every((t) => t.coefficient.sign() > 0);
}
