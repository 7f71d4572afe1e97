/** Small ODE systems with analytic Jacobians shared by the numeric tests. */
import type { OdeSystem } from '../../../src/engine/numeric/stiff-integrator.ts';
import { ROSENBROCK_METHOD } from '../../../src/engine/numeric/rosenbrock-method.ts';
import { createWorkspace, rosenbrockStep } from '../../../src/engine/numeric/rosenbrock-step.ts';

/** y' = K y for a constant matrix K (first-order kinetics). */
export function linearSystem(k: readonly (readonly number[])[]): OdeSystem {
  const n = k.length;
  return {
    size: n,
    rhs(_t, y, dydt) {
      for (let i = 0; i < n; i++) {
        let s = 0;
        for (let j = 0; j < n; j++) s += k[i]![j]! * y[j]!;
        dydt[i] = s;
      }
    },
    jacobian(_t, _y, J) {
      for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) J[i * n + j] = k[i]![j]!;
    },
  };
}

/**
 * Integrates with n equal steps (no error control), advancing with the main formula or with the
 * embedded one (ŷ₁ = y₁ − err), for measuring the observed order of each.
 */
export function fixedSteps(
  system: OdeSystem,
  y0: Float64Array,
  tEnd: number,
  n: number,
  formula: 'main' | 'embedded' = 'main',
): Float64Array {
  const size = system.size;
  const h = tEnd / n;
  const ws = createWorkspace(size, ROSENBROCK_METHOD);
  const f0 = new Float64Array(size);
  const J = new Float64Array(size * size);
  let y = Float64Array.from(y0);
  let y1 = new Float64Array(size);
  const err = new Float64Array(size);
  for (let step = 0; step < n; step++) {
    const t = step * h;
    system.rhs(t, y, f0);
    system.jacobian(t, y, J);
    rosenbrockStep(system, t, h, y, f0, J, y1, err, ws);
    if (formula === 'embedded') for (let i = 0; i < size; i++) y1[i] = y1[i]! - err[i]!;
    [y, y1] = [y1, y];
  }
  return y;
}
