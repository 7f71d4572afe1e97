/**
 * A small dense system A x = b in plain arrays (Newton steps of the numeric steady state), solved
 * by the LU factors with iterative refinement, so that equations many decades smaller than
 * others keep their accuracy.
 */
import { luFactor, luSolveRefined } from './lu.ts';

/** Solves A x = b; undefined when A is singular to working precision. */
export function solveDense(a: readonly (readonly number[])[], b: readonly number[]): number[] | undefined {
  const n = b.length;
  const matrix = Float64Array.from(a.flat());
  const factors = Float64Array.from(matrix);
  const pivots = new Int32Array(n);
  if (!luFactor(factors, n, pivots)) return undefined;
  const x = new Float64Array(n);
  luSolveRefined(matrix, factors, n, pivots, Float64Array.from(b), x, new Float64Array(n));
  const out = Array.from(x);
  return out.every(Number.isFinite) ? out : undefined;
}
