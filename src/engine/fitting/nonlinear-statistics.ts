/**
 * The statistics of a nonlinear fit at its minimum, from the Jacobian (the linear approximation
 * the whole trade uses): covariance s²(JᵀJ)⁻¹ through a singular value decomposition of the
 * column-scaled Jacobian, standard errors, Student-t intervals, correlations, and which
 * parameters the data do not determine.
 */
import { Matrix, SingularValueDecomposition } from 'ml-matrix';
import { CONFIDENCE_LEVEL, intervalMultiplier } from './distributions.ts';
import { correlationMatrix } from './fitted-parameter.ts';
import type { FitIssue } from './fitted-parameter.ts';
import type { NonlinearFit, NonlinearParameterFit, NonlinearProblem } from './nonlinear-fit.ts';

/**
 * A parameter whose standard error exceeds its value (or, fitted as a logarithm, whose interval
 * spans more than a factor e either way per standard error) is not determined by the data —
 * common practice, not a theorem.
 */
export const POORLY_DETERMINED = 1;
/** Column-scaled Jacobians with a condition number above this are treated as singular. */
export const SINGULAR_CONDITION = 1e8;

interface Progress {
  iterations: number;
  offset: number;
}

/** The fit's statistics at theta (parameters on the fitting scale: ln for positive ones). */
export function nonlinearStatistics(
  problem: NonlinearProblem,
  theta: readonly number[],
  jacobian: readonly (readonly number[])[],
  model: (theta: readonly number[]) => readonly number[],
  y: readonly number[],
  progress: Progress,
  issues: FitIssue[],
): NonlinearFit {
  const p = theta.length;
  const n = y.length;
  const scaledFitted = model(theta);
  const residualsScaled = scaledFitted.map((f, i) => y[i]! - f);
  const rss = residualsScaled.reduce((s, r) => s + r * r, 0);
  const dof = n - p;
  const variance = problem.weighting === 'absolute' ? 1 : dof > 0 ? rss / dof : NaN;
  const { inverse, condition, nullLoadings } = scaledInverse(jacobian, p);
  const logScale = problem.parameters.map((q) => q.positive === true);
  const values = theta.map((t, j) => (logScale[j] ? Math.exp(t) : t));
  // Covariance of θ, then of the natural parameters through the derivative of exp.
  const covTheta = inverse.map((row) => row.map((c) => c * variance));
  const covariance = covTheta.map((row, a) =>
    row.map((c, b) => c * (logScale[a] ? values[a]! : 1) * (logScale[b] ? values[b]! : 1)),
  );
  const t = intervalMultiplier(dof);
  const parameters = problem.parameters.map((q, j): NonlinearParameterFit => {
    const seTheta = Math.sqrt(covTheta[j]![j]!);
    const value = values[j]!;
    const interval: readonly [number, number] = logScale[j]
      ? [Math.exp(theta[j]! - t * seTheta), Math.exp(theta[j]! + t * seTheta)]
      : [value - t * seTheta, value + t * seTheta];
    const note = identifiabilityNote(seTheta, value, logScale[j]!, condition, nullLoadings[j]!);
    if (note) issues.push({ kind: 'not-identifiable', parameter: q.name, message: `${q.name}: ${note}` });
    const base = {
      name: q.name,
      value,
      standardError: Math.sqrt(covariance[j]![j]!),
      interval,
      level: CONFIDENCE_LEVEL,
      scale: logScale[j] ? ('log' as const) : ('linear' as const),
    };
    const withLog = logScale[j] ? { ...base, logStandardError: seTheta } : base;
    return note ? { ...withLog, identifiable: false, identifiabilityNote: note } : { ...withLog, identifiable: true };
  });
  if (condition > SINGULAR_CONDITION)
    issues.push({
      kind: 'ill-conditioned',
      message: `the parameters are nearly interchangeable in these data (condition number ${condition.toExponential(1)})`,
    });
  const root = (problem.weights ?? y.map(() => 1)).map((w) => Math.sqrt(w));
  const fitted = scaledFitted.map((f, i) => f / root[i]!);
  return {
    parameters,
    covariance,
    correlation: correlationMatrix(covariance),
    rss,
    n,
    dof,
    residualStandardDeviation: Math.sqrt(rss / dof),
    fitted,
    residuals: problem.y.map((v, i) => v - fitted[i]!),
    converged: !issues.some((i) => i.kind === 'not-converged' || i.kind === 'model-failed'),
    iterations: progress.iterations,
    relativeOffset: progress.offset,
    conditionNumber: condition,
    issues,
  };
}

function identifiabilityNote(
  seTheta: number,
  value: number,
  logScale: boolean,
  condition: number,
  nullLoading: number,
): string | undefined {
  if (condition > SINGULAR_CONDITION && nullLoading > 0.1)
    return 'the data cannot separate it from the other parameters (near-singular covariance)';
  if (!Number.isFinite(seTheta)) return 'its standard error cannot be estimated from these data';
  const relative = logScale ? seTheta : seTheta / Math.abs(value);
  if (relative > POORLY_DETERMINED) return 'its standard error exceeds its value: these data do not determine it';
  return undefined;
}

/** (JᵀJ)⁻¹ from the SVD of J with unit-length columns, its condition number and each parameter's weight on the weakest direction. */
function scaledInverse(
  jacobian: readonly (readonly number[])[],
  p: number,
): { inverse: number[][]; condition: number; nullLoadings: number[] } {
  const failed = { inverse: nanMatrix(p), condition: Infinity, nullLoadings: new Array<number>(p).fill(1) };
  if (jacobian.length === 0 || !jacobian.every((row) => row.every(Number.isFinite))) return failed;
  const norms = Array.from({ length: p }, (_, j) => Math.hypot(...jacobian.map((row) => row[j]!)));
  if (norms.some((s) => !(s > 0))) return failed;
  const scaled = new Matrix(jacobian.map((row) => row.map((d, j) => d / norms[j]!)));
  const svd = new SingularValueDecomposition(scaled, { autoTranspose: true });
  const sigma = svd.diagonal;
  const v = svd.rightSingularVectors;
  const largest = Math.max(...sigma);
  const smallestIndex = sigma.indexOf(Math.min(...sigma));
  const inverse = Array.from({ length: p }, (_, a) =>
    Array.from({ length: p }, (_, b) => {
      let c = 0;
      sigma.forEach((s, k) => (c += (v.get(a, k) * v.get(b, k)) / (s * s)));
      return c / (norms[a]! * norms[b]!);
    }),
  );
  return {
    inverse,
    condition: largest / sigma[smallestIndex]!,
    nullLoadings: Array.from({ length: p }, (_, j) => Math.abs(v.get(j, smallestIndex))),
  };
}

function nanMatrix(p: number): number[][] {
  return Array.from({ length: p }, () => new Array<number>(p).fill(NaN));
}
