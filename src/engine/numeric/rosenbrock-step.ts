/**
 * One step of the Rosenbrock method in transformed form (Hairer & Wanner II, section IV.7):
 * a single LU factorisation of I/(hγ) − J serves every stage, and each stage is one linear solve,
 * so the step stays stable however stiff the kinetics is. Each solve is refined against the matrix
 * (lu.ts), since the stages of a radical at 1e-15 M must not carry the rounding of a reactant's
 * equation at 1e-3 M: an error the embedded estimate, built from the same stages, cannot see.
 */
import { luFactor, luSolveRefined } from './lu.ts';
import { ROSENBROCK_METHOD, type TransformedMethod } from './rosenbrock-method.ts';
import type { OdeSystem } from './stiff-integrator.ts';

/** Scratch arrays of one integration, allocated once so that steps allocate nothing. */
export interface StepWorkspace {
  n: number;
  /** The iteration matrix I/(hγ) − J, kept beside its LU factors for the refinement residual. */
  matrix: Float64Array;
  factors: Float64Array;
  pivots: Int32Array;
  /** A stage's right-hand side, kept while its solution is refined, and the residual. */
  rhs: Float64Array;
  residual: Float64Array;
  stages: Float64Array[];
  argument: Float64Array;
}

/** What a step attempt came to; 'singular' and 'non-finite' ask the caller for a smaller step. */
export type StepOutcome = 'ok' | 'singular' | 'non-finite';

/** Scratch space for a system of n equations. */
export function createWorkspace(n: number, method: TransformedMethod = ROSENBROCK_METHOD): StepWorkspace {
  return {
    n,
    matrix: new Float64Array(n * n),
    factors: new Float64Array(n * n),
    pivots: new Int32Array(n),
    rhs: new Float64Array(n),
    residual: new Float64Array(n),
    stages: Array.from({ length: method.stages }, () => new Float64Array(n)),
    argument: new Float64Array(n),
  };
}

/**
 * Advances y0 (with f0 = f(t, y0) and jacobian = ∂f/∂y there) by h into y1, and writes the
 * difference from the embedded solution into err. The system is taken as autonomous in the
 * Jacobian (no ∂f/∂t term), as mass-action kinetics is.
 */
export function rosenbrockStep(
  system: OdeSystem,
  t: number,
  h: number,
  y0: Float64Array,
  f0: Float64Array,
  jacobian: Float64Array,
  y1: Float64Array,
  err: Float64Array,
  ws: StepWorkspace,
  method: TransformedMethod = ROSENBROCK_METHOD,
): StepOutcome {
  const { n, matrix, factors, pivots, rhs, residual, stages, argument } = ws;
  const diagonal = 1 / (h * method.gamma);
  for (let k = 0; k < n * n; k++) matrix[k] = -jacobian[k]!;
  for (let i = 0; i < n; i++) matrix[i * n + i] = matrix[i * n + i]! + diagonal;
  factors.set(matrix);
  if (!luFactor(factors, n, pivots)) return 'singular';

  for (let s = 0; s < method.stages; s++) {
    const u = stages[s]!;
    const aRow = method.a[s]!;
    const cRow = method.c[s]!;
    // A stage whose argument is y0 at time t reuses f0 instead of calling the system again.
    let atStart = method.stageTimes[s] === 0;
    for (let j = 0; j < s && atStart; j++) atStart = aRow[j] === 0;
    if (atStart) {
      u.set(f0);
    } else {
      argument.set(y0);
      for (let j = 0; j < s; j++) addScaled(argument, aRow[j]!, stages[j]!);
      system.rhs(t + method.stageTimes[s]! * h, argument, u);
    }
    for (let j = 0; j < s; j++) addScaled(u, cRow[j]! / h, stages[j]!);
    rhs.set(u);
    luSolveRefined(matrix, factors, n, pivots, rhs, u, residual);
  }

  y1.set(y0);
  err.fill(0);
  for (let s = 0; s < method.stages; s++) {
    addScaled(y1, method.m[s]!, stages[s]!);
    addScaled(err, method.errorWeights[s]!, stages[s]!);
  }
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(y1[i]!) || !Number.isFinite(err[i]!)) return 'non-finite';
  }
  return 'ok';
}

/** target += factor × v; a zero factor is skipped so that rounding noise is not added. */
function addScaled(target: Float64Array, factor: number, v: Float64Array): void {
  if (factor === 0) return;
  for (let i = 0; i < target.length; i++) target[i] = target[i]! + factor * v[i]!;
}
