import { Polynomial } from './polynomial.ts';
import { RationalFunction } from './rational-function.ts';
import { coefficientsIn } from './univariate.ts';
import { WorkBudget } from './work-budget.ts';

/**
 * Replaces x by N/D in p and clears the denominator: returns D^d · p(N/D), with d the degree of p
 * in x, computed by Horner's rule on the homogenised form Σ c_k N^k D^(d−k). The work is charged to
 * the budget (undefined once it is spent); x must occur with natural exponents only (a
 * programmer mistake otherwise: throws).
 */
export function substituteFraction(
  p: Polynomial,
  x: string,
  numerator: Polynomial,
  denominator: Polynomial,
  budget: WorkBudget = WorkBudget.unlimited(),
): { polynomial: Polynomial; degree: number } | undefined {
  const coefficients = coefficientsIn(p, x);
  if (!coefficients) throw new RangeError(`substituteFraction: ${x} is not a polynomial variable of p`);
  const degree = Math.max(0, ...coefficients.keys());
  if (degree === 0) return { polynomial: p, degree };
  const powers = [Polynomial.ONE];
  for (let k = 1; k <= degree; k++) {
    const next = times(powers[k - 1]!, denominator, budget);
    if (!next) return undefined;
    powers.push(next);
  }
  let result = coefficients.get(degree) ?? Polynomial.ZERO;
  for (let k = degree - 1; k >= 0; k--) {
    const shifted = times(result, numerator, budget);
    const c = coefficients.get(k);
    const added = c ? times(c, powers[degree - k]!, budget) : Polynomial.ZERO;
    if (!shifted || !added) return undefined;
    result = shifted.add(added);
  }
  return { polynomial: result, degree };
}

/** f with x replaced by a rational function (x with natural exponents in f). */
export function substituteRational(
  f: RationalFunction,
  x: string,
  value: RationalFunction,
  budget: WorkBudget = WorkBudget.unlimited(),
): RationalFunction | undefined {
  const [n, d] = [f.numerator, f.denominator];
  const top = substituteFraction(n, x, value.numerator, value.denominator, budget);
  const bottom = substituteFraction(d, x, value.numerator, value.denominator, budget);
  if (!top || !bottom) return undefined;
  // top/D^a over bottom/D^b: the surplus power of D goes to the side with the smaller degree.
  const surplus = value.denominator.pow(Math.abs(top.degree - bottom.degree));
  if (!budget.chargeProduct(surplus, top.degree >= bottom.degree ? bottom.polynomial : top.polynomial))
    return undefined;
  return top.degree >= bottom.degree
    ? RationalFunction.of(top.polynomial, bottom.polynomial.mul(surplus))
    : RationalFunction.of(top.polynomial.mul(surplus), bottom.polynomial);
}

/** p·q charged to the budget. */
export function times(p: Polynomial, q: Polynomial, budget: WorkBudget): Polynomial | undefined {
  if (p.isZero() || q.isZero()) return Polynomial.ZERO;
  return budget.chargeProduct(p, q) ? p.mul(q) : undefined;
}
