/**
 * Nonlinear least squares by Levenberg–Marquardt (the ml-levenberg-marquardt package does the
 * iterations), with what a kineticist needs around it: positive parameters fitted as logarithms,
 * a convergence test of our own (the package stops only at its iteration cap), standard errors and
 * correlations from the Jacobian at the minimum, and a plain flag on every parameter the data do
 * not determine. Nothing here throws; a failed fit says why in `issues`.
 */
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { numericJacobian } from './numeric-jacobian.ts';
import { relativeOffset } from './relative-offset.ts';
import { nonlinearStatistics } from './nonlinear-statistics.ts';
import type { FitIssue } from './fitted-parameter.ts';
import { linearLeastSquares } from './linear-least-squares.ts';
import type { NonlinearFit, NonlinearProblem } from './nonlinear-fit.ts';

/** How hard to try. */
export interface NonlinearOptions {
  /** Levenberg–Marquardt iterations in all (default 3000) */
  maxIterations?: number;
  /** converged when the relative offset falls below this (default 1e-6) */
  tolerance?: number;
  /** relative step of the central differences where the problem has no Jacobian (default ∛ε; larger for a model computed by an integrator) */
  differenceStep?: number;
  /** iterations between convergence checks (default 25); fewer for a model that is costly to evaluate */
  round?: number;
}

const ROUND = 25;

/** Fits the model's parameters to y; starting values must give a finite model. */
export function fitNonlinear(problem: NonlinearProblem, options: NonlinearOptions = {}): NonlinearFit {
  const { maxIterations = 3000, tolerance = 1e-6 } = options;
  const p = problem.parameters.length;
  const n = problem.y.length;
  const root = (problem.weights ?? problem.y.map(() => 1)).map((w) => Math.sqrt(w));
  const natural = (theta: readonly number[]) =>
    theta.map((t, j) => (problem.parameters[j]!.positive ? Math.exp(t) : t));
  const scaledModel = (theta: readonly number[]) => problem.model(natural(theta)).map((f, i) => root[i]! * f);
  const scaledY = problem.y.map((v, i) => root[i]! * v);
  const jacobian = (theta: readonly number[]): number[][] => {
    if (!problem.jacobian) return numericJacobian(scaledModel, theta, options.differenceStep);
    const values = natural(theta);
    return problem
      .jacobian(values)
      .map((row, i) => row.map((d, j) => root[i]! * d * (problem.parameters[j]!.positive ? values[j]! : 1)));
  };
  let theta = problem.parameters.map((q) => (q.positive ? Math.log(q.initial) : q.initial));
  const issues: FitIssue[] = [];
  if (n <= p) issues.push({ kind: 'too-few-points', message: `${n} points cannot determine ${p} parameters` });
  if (!scaledModel(theta).every(Number.isFinite) || !theta.every(Number.isFinite)) {
    issues.push({ kind: 'model-failed', message: 'the model cannot be evaluated at the starting values' });
    return nonlinearStatistics(
      problem,
      theta,
      jacobian(theta),
      scaledModel,
      scaledY,
      { iterations: 0, offset: NaN },
      issues,
    );
  }
  // The iterations run on φⱼ = cⱼ θⱼ, with cⱼ the length of the Jacobian's column j at the start,
  // so the package's damping (λ added to every diagonal element alike) treats a parameter of
  // 1e5 J/mol and one of 10 J/(mol K) alike: Marquardt's scaling, done outside the package.
  const columns = columnLengths(jacobian(theta));
  const toTheta = (phi: readonly number[]) => phi.map((f, j) => f / columns[j]!);
  const phiModel = (phi: readonly number[]) => scaledModel(toTheta(phi));
  const phiJacobian = (phi: readonly number[]) =>
    jacobian(toTheta(phi)).map((row) => row.map((d, j) => d / columns[j]!));
  let phi = theta.map((t, j) => t * columns[j]!);
  let iterations = 0;
  let offset = NaN;
  let rss = sumOfSquares(phiModel(phi), scaledY);
  // The package keeps a step even when it raises the sum of squares (it returns the best point it
  // saw), so with a damping too small for the problem it can wander without ever improving. Each
  // round therefore starts from the best point so far, and the damping is raised tenfold after a
  // round that found nothing better.
  let damping = 1e-3;
  while (iterations < maxIterations && damping < 1e12) {
    const steps = Math.min(options.round ?? ROUND, maxIterations - iterations);
    const next = runRound(phi, steps, damping, phiModel, phiJacobian, scaledY);
    iterations += steps;
    const nextRss = sumOfSquares(phiModel(next), scaledY);
    if (nextRss < rss) {
      phi = next;
      rss = nextRss;
      damping = Math.max(damping / 10, 1e-7);
    } else damping *= 10;
    offset = relativeOffset(phiJacobian(phi), residualsOf(phiModel(phi), scaledY));
    if (offset < tolerance || rss === 0) break;
  }
  theta = toTheta(phi);
  ({ theta, offset } = polish(theta, offset, scaledModel, jacobian, scaledY));
  if (!(offset < tolerance)) {
    const what = Number.isFinite(offset) ? `relative offset ${offset.toExponential(2)}` : 'no convergence measure';
    issues.push({
      kind: 'not-converged',
      message: `the fit did not converge after ${iterations} iterations (${what})`,
    });
  }
  return nonlinearStatistics(problem, theta, jacobian(theta), scaledModel, scaledY, { iterations, offset }, issues);
}

/** One round of the package's Levenberg–Marquardt iterations from theta; returns the best point found. */
function runRound(
  theta: readonly number[],
  steps: number,
  damping: number,
  model: (theta: readonly number[]) => readonly number[],
  jacobian: (theta: readonly number[]) => number[][],
  y: readonly number[],
): number[] {
  const index = y.map((_, i) => i);
  try {
    const result = levenbergMarquardt(
      { x: index, y },
      (params) => {
        const values = model(params);
        return (i) => values[i]!;
      },
      {
        initialValues: theta,
        maxIterations: steps,
        // The package's own stop is an absolute sum of squares; ours is the relative offset.
        errorTolerance: 0,
        damping,
        jacobianFunction: (params) => {
          const rows = jacobian(params);
          return (i) => rows[i]!;
        },
      },
    );
    return result.parameterValues.every(Number.isFinite) ? result.parameterValues : theta.slice();
  } catch {
    // The package throws on degenerate input (fewer than two points, a timeout): keep the last point.
    return theta.slice();
  }
}

/**
 * Up to three Gauss–Newton steps from the minimum the iterations found, each kept only when it
 * lowers the relative offset and not the fit: near the minimum the sum of squares is flat to rounding, so a
 * method that compares sums of squares stops a few digits short of what the data support.
 */
function polish(
  start: readonly number[],
  startOffset: number,
  model: (theta: readonly number[]) => readonly number[],
  jacobian: (theta: readonly number[]) => number[][],
  y: readonly number[],
): { theta: number[]; offset: number } {
  let theta = start.slice();
  let offset = startOffset;
  let rss = sumOfSquares(model(theta), y);
  for (let k = 0; k < 3 && offset > 0; k++) {
    const residuals = residualsOf(model(theta), y);
    const step = linearLeastSquares({ design: jacobian(theta), y: residuals }).parameters.map((q) => q.value);
    const next = theta.map((t, j) => t + step[j]!);
    if (!next.every(Number.isFinite)) break;
    const nextRss = sumOfSquares(model(next), y);
    const nextOffset = relativeOffset(jacobian(next), residualsOf(model(next), y));
    // Kept only if it lowers the offset without raising the sum of squares beyond rounding.
    if (!(nextOffset < offset) || !(nextRss <= rss * (1 + 1e-12))) break;
    theta = next;
    offset = nextOffset;
    rss = nextRss;
  }
  return { theta, offset };
}

function residualsOf(fitted: readonly number[], y: readonly number[]): number[] {
  return y.map((v, i) => v - fitted[i]!);
}

function sumOfSquares(fitted: readonly number[], y: readonly number[]): number {
  const rss = y.reduce((s, v, i) => s + (v - fitted[i]!) ** 2, 0);
  return Number.isNaN(rss) ? Infinity : rss;
}

function columnLengths(jacobian: readonly (readonly number[])[]): number[] {
  const p = jacobian[0]?.length ?? 0;
  return Array.from({ length: p }, (_, j) => {
    const length = Math.hypot(...jacobian.map((row) => row[j]!));
    return Number.isFinite(length) && length > 0 ? length : 1;
  });
}
