/**
 * The extra-sum-of-squares F test for two nested least-squares models fitted to the same n
 * points: does the larger model reduce the residual sum of squares by more than its extra
 * parameters would by chance? F = ((RSS₁ − RSS₂)/(p₂ − p₁)) / (RSS₂/(n − p₂)), referred to
 * F(p₂ − p₁, n − p₂). Exact for linear models with normal errors; for nonlinear ones the usual
 * approximation.
 */
import { fTailProbability } from './distributions.ts';

/** A fitted model as the test needs it. */
export interface NestedModel {
  rss: number;
  /** the number of fitted parameters */
  parameters: number;
}

/** The F statistic, its degrees of freedom and the probability of an F at least this large if the smaller model were true. */
export interface FTestResult {
  f: number;
  df1: number;
  df2: number;
  pValue: number;
  /** false when the models are not nested in this order or too few points remain (then f and pValue are NaN) */
  valid: boolean;
}

/** Compares a simpler model nested in a more complex one, both fitted to the same n points. */
export function nestedFTest(simpler: NestedModel, complex: NestedModel, n: number): FTestResult {
  const df1 = complex.parameters - simpler.parameters;
  const df2 = n - complex.parameters;
  if (!(df1 >= 1) || !(df2 >= 1) || !(complex.rss >= 0) || !(simpler.rss >= 0))
    return { f: NaN, df1, df2, pValue: NaN, valid: false };
  const f = (simpler.rss - complex.rss) / df1 / (complex.rss / df2);
  return { f, df1, df2, pValue: fTailProbability(f, df1, df2), valid: true };
}
