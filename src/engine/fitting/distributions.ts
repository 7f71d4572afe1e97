/**
 * The probability distributions a least-squares report needs: Student's t for confidence
 * intervals, Fisher's F for comparing nested models and χ² for judging a fit against stated
 * uncertainties. Quantiles come from jstat, a well-kept statistics package, rather than from a table.
 */
import jStat from 'jstat';

/** The two-sided confidence level used throughout the fitting module (95 %). */
export const CONFIDENCE_LEVEL = 0.95;

/**
 * The Student t quantile t(p, ν): the value below which a fraction p of the distribution with ν
 * degrees of freedom lies. NaN when ν < 1 or p is outside (0, 1): no interval can be given.
 */
export function studentTQuantile(p: number, dof: number): number {
  if (!(dof >= 1) || !(p > 0 && p < 1)) return NaN;
  return jStat.studentt.inv(p, dof);
}

/** The half-width multiplier of a two-sided interval at `level` (0.95 → t(0.975, ν)). */
export function intervalMultiplier(dof: number, level = CONFIDENCE_LEVEL): number {
  return studentTQuantile(1 - (1 - level) / 2, dof);
}

/** The upper tail probability P(F ≥ f) of Fisher's F distribution with (df1, df2) degrees of freedom. */
export function fTailProbability(f: number, df1: number, df2: number): number {
  if (!(df1 >= 1) || !(df2 >= 1) || Number.isNaN(f)) return NaN;
  if (f <= 0) return 1;
  if (!Number.isFinite(f)) return 0;
  return Math.min(1, Math.max(0, 1 - jStat.centralF.cdf(f, df1, df2)));
}

/** The upper tail probability P(χ² ≥ x) with ν degrees of freedom (NaN for ν < 1). */
export function chiSquareTailProbability(x: number, dof: number): number {
  if (!(dof >= 1) || Number.isNaN(x)) return NaN;
  if (x <= 0) return 1;
  if (!Number.isFinite(x)) return 0;
  return Math.min(1, Math.max(0, 1 - jStat.chisquare.cdf(x, dof)));
}
