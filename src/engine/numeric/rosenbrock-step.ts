/**
 * One step of the Rosenbrock method in transformed form (Hairer & Wanner II, section IV.7):
 * a single LU factorisation of I/(hγ) − J serves every stage, and each stage is one linear solve,
 * so the step stays stable however stiff the kinetics is. The solves are refined to working
 * precision in every component, in double-double where doubles do not converge (iteration-matrix.ts):
 * a fast pre-equilibrium beside a long step makes the matrix near-singular along the conservation
 * laws, and a radical at 1e-15 M must not carry the rounding of a reactant's equation at 1e-3 M; in
 * either case an error the embedded estimate, built from the same stages, cannot see.
 */
import {
  createIterationMatrix,
  factorIterationMatrix,
  solveIterationMatrix,
  type IterationMatrix,
} from './iteration-matrix.ts';
import { ROSENBROCK_METHOD, type TransformedMethod } from './rosenbrock-method.ts';
import type { OdeSystem } from './ode-system.ts';

/** Scratch arrays of one integration, allocated once so that steps allocate nothing. */
export interface StepWorkspace {
  n: number;
  /** The iteration matrix I/(hγ) − J and its factors (doubles, refined; double-double where needed). */
  lu: IterationMatrix;
  stages: Float64Array[];
  argument: Float64Array;
}

/** What a step attempt came to; 'singular' and 'non-finite' ask the caller for a smaller step. */
export type StepOutcome = 'ok' | 'singular' | 'non-finite';

/** Scratch space for a system of n equations. */
export function createWorkspace(n: number, method: TransformedMethod = ROSENBROCK_METHOD): StepWorkspace {
  return {
    n,
    lu: createIterationMatrix(n),
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
  const { n, lu, stages, argument } = ws;
  // One factorisation serves all the stages.
  if (!factorIterationMatrix(lu, 1 / (h * method.gamma), jacobian)) return 'singular';

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
    solveIterationMatrix(lu, u, u);
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
