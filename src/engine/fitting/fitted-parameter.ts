/**
 * A fitted parameter as every fit in this module reports it: the value, its standard error, a
 * 95 % confidence interval from Student's t, and whether the data determine it at all.
 */
import { CONFIDENCE_LEVEL, intervalMultiplier } from './distributions.ts';

/** One fitted parameter with its uncertainty. */
export interface FittedParameter {
  name: string;
  value: number;
  /** standard error (one standard deviation of the estimate); NaN when it cannot be estimated */
  standardError: number;
  /** the two-sided confidence interval at `level` (Student t with the fit's degrees of freedom) */
  interval: readonly [number, number];
  level: number;
  /** false when these data do not determine the parameter (see `identifiabilityNote`) */
  identifiable: boolean;
  /** why the parameter is not identifiable, in words */
  identifiabilityNote?: string;
}

/** A symmetric interval value ± t·SE, with t from the degrees of freedom. */
export function symmetricInterval(value: number, standardError: number, dof: number): readonly [number, number] {
  const half = intervalMultiplier(dof) * standardError;
  return Number.isFinite(half) ? [value - half, value + half] : [NaN, NaN];
}

/** Builds a parameter with a symmetric interval; identifiable unless a note is given. */
export function fittedParameter(
  name: string,
  value: number,
  standardError: number,
  dof: number,
  note?: string,
): FittedParameter {
  const base = {
    name,
    value,
    standardError,
    interval: symmetricInterval(value, standardError, dof),
    level: CONFIDENCE_LEVEL,
  };
  return note === undefined
    ? { ...base, identifiable: true }
    : { ...base, identifiable: false, identifiabilityNote: note };
}

/** The correlation matrix of a covariance matrix (NaN where a variance is zero or not finite). */
export function correlationMatrix(covariance: readonly (readonly number[])[]): number[][] {
  const sd = covariance.map((row, i) => Math.sqrt(row[i]!));
  return covariance.map((row, i) => row.map((c, j) => (i === j ? 1 : c / (sd[i]! * sd[j]!))));
}

/** Something the caller should know about a fit, with a stable kind for rules and pages. */
export interface FitIssue {
  kind: 'not-converged' | 'not-identifiable' | 'ill-conditioned' | 'model-failed' | 'too-few-points';
  parameter?: string;
  message: string;
}

/** What every least-squares fit reports besides its parameters. */
export interface LeastSquaresSummary {
  covariance: number[][];
  correlation: number[][];
  /** weighted residual sum of squares Σ wᵢ rᵢ² */
  rss: number;
  /** points */
  n: number;
  /** degrees of freedom: points less fitted parameters */
  dof: number;
  /** √(rss / dof): the residual standard deviation (for unit weights, in the unit of y) */
  residualStandardDeviation: number;
  fitted: number[];
  /** y − fitted, unweighted */
  residuals: number[];
}
