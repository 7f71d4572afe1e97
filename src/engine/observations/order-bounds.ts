/**
 * The orders a rate law allows in one species for some positive values of its constants and of
 * the other concentrations. For r = N/D with positive coefficients, x ∂ln N/∂x is a weighted mean
 * of the exponents of x in the terms of N (weights: the terms' positive values), and likewise for
 * D; so the apparent order never leaves [min(N) − max(D), max(N) − min(D)] (an outer bound: where
 * terms share constants it need not reach every order inside). The limits as [X] → 0 and ∞ alone do not bound it
 * once other terms compete (products or other species present, or two paths in the numerator).
 * A law with terms of both signs (a reversible overall reaction) bounds nothing.
 */
import type { RationalFunction } from '../exact/index.ts';
import type { Rational } from '../exact/rational.ts';

/** The orders the law allows in `symbol`: [lowest, highest], or 'unbounded' when a coefficient is not positive. */
export function orderBounds(expression: RationalFunction, symbol: string): [Rational, Rational] | 'unbounded' {
  const { numerator, denominator } = expression;
  const positive = [...numerator.terms, ...denominator.terms].every((t) => t.coefficient.sign() > 0);
  if (!positive || numerator.terms.length === 0) return 'unbounded';
  const [nLow, nHigh] = [numerator.lowDegreeIn(symbol), numerator.degreeIn(symbol)];
  const [dLow, dHigh] = [denominator.lowDegreeIn(symbol), denominator.degreeIn(symbol)];
  return [nLow.sub(dHigh), nHigh.sub(dLow)];
}
