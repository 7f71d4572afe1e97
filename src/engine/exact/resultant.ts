import { determinantWithin } from './bareiss.ts';
import { Polynomial } from './polynomial.ts';
import { coefficientsIn } from './univariate.ts';
import { WorkBudget } from './work-budget.ts';

/**
 * The resultant of f and g with respect to x: the determinant of their Sylvester matrix, a
 * polynomial in the other symbols that vanishes exactly where f and g share a root in x. It
 * eliminates x from two equations at once (at the price of degree: deg = deg_x f · deg_x g at
 * most). Undefined when x is not a polynomial variable of both, or the budget runs out.
 */
export function resultant(
  f: Polynomial,
  g: Polynomial,
  x: string,
  budget: WorkBudget = WorkBudget.unlimited(),
): Polynomial | undefined {
  const cf = coefficientsIn(f, x);
  const cg = coefficientsIn(g, x);
  if (!cf || !cg) return undefined;
  const m = Math.max(0, ...cf.keys());
  const n = Math.max(0, ...cg.keys());
  if (m === 0 || n === 0) return undefined;
  const size = m + n;
  const row = (c: ReadonlyMap<number, Polynomial>, degree: number, shift: number): Polynomial[] =>
    Array.from({ length: size }, (_, j) => c.get(degree - (j - shift)) ?? Polynomial.ZERO);
  const rows = [
    ...Array.from({ length: n }, (_, i) => row(cf, m, i)),
    ...Array.from({ length: m }, (_, i) => row(cg, n, i)),
  ];
  const d = determinantWithin(rows, budget);
  return d === 'budget' ? undefined : d;
}
