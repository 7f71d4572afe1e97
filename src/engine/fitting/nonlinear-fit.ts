/**
 * The shapes of a nonlinear least-squares problem and of its fit, shared by the fitting loop
 * (nonlinear-least-squares.ts) and the statistics at the minimum (nonlinear-statistics.ts).
 */
import type { FitIssue, FittedParameter, LeastSquaresSummary } from './fitted-parameter.ts';
import type { Weighting } from './linear-least-squares.ts';

/** One parameter of a nonlinear model. */
export interface NonlinearParameter {
  name: string;
  /** the starting value (on the natural scale) */
  initial: number;
  /** true: fitted as ln(value), so it stays positive (rate and equilibrium constants) */
  positive?: boolean;
}

/** A nonlinear least-squares problem: the model gives every point's value at once. */
export interface NonlinearProblem {
  parameters: readonly NonlinearParameter[];
  /** the model's value at each point, for parameter values on the natural scale */
  model(values: readonly number[]): readonly number[];
  /** ∂fᵢ/∂pⱼ on the natural scale (rows points, columns parameters); central differences when absent */
  jacobian?(values: readonly number[]): readonly (readonly number[])[];
  y: readonly number[];
  /** one weight per point (1/σ² when uncertainties are known); all 1 when absent */
  weights?: readonly number[];
  weighting?: Weighting;
}

/** A fitted parameter of a nonlinear model, and the scale it was fitted on. */
export interface NonlinearParameterFit extends FittedParameter {
  /** 'log': fitted as ln(value); the interval is exp(ln value ± t·SE(ln value)), not symmetric */
  scale: 'linear' | 'log';
  /** SE of ln(value) for a parameter fitted on the log scale */
  logStandardError?: number;
}

/** A nonlinear least-squares fit. */
export interface NonlinearFit extends LeastSquaresSummary {
  parameters: NonlinearParameterFit[];
  converged: boolean;
  iterations: number;
  /** the Bates–Watts relative offset at the end (below `tolerance` when converged) */
  relativeOffset: number;
  /** condition number of the column-scaled Jacobian: large means the parameters are entangled */
  conditionNumber: number;
  issues: FitIssue[];
}
