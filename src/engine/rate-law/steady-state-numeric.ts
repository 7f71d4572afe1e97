/**
 * The nonlinear steady state at given conditions (chain carriers recombining, for instance):
 * Newton's method on the steady-state and conservation equations in logarithmic unknowns
 * (concentrations stay positive), with an analytic Jacobian from the polynomial derivatives,
 * damping, and several starting scales because radical concentrations span many decades.
 */
import type { Polynomial } from '../exact/index.ts';
import { solveDense } from '../numeric/solve-dense.ts';
import type { NonlinearSystem } from './rate-law.ts';

const STARTING_SCALES = [1e-9, 1e-6, 1e-3, 1e-12, 1e-15, 1];
const MAX_ITERATIONS = 200;

/** The internal concentrations and the overall rate at the given values, or undefined without convergence. */
export function solveSteadyStateNumeric(
  system: NonlinearSystem,
  values: ReadonlyMap<string, number>,
): { concentrations: Map<string, number>; rate: number } | undefined {
  const { unknowns, equations } = system;
  const needed = new Set([...equations.flatMap((e) => e.symbols()), ...system.rate.symbols()]);
  for (const s of needed) if (!unknowns.includes(s) && !values.has(s)) return undefined;
  const jacobian = jacobianOf(system);
  for (const scale of STARTING_SCALES) {
    const z = unknowns.map(() => Math.log(scale));
    if (newton(equations, jacobian, unknowns, values, z)) {
      const concentrations = new Map(unknowns.map((u, i) => [u, Math.exp(z[i]!)]));
      const all = new Map([...values, ...concentrations]);
      return { concentrations, rate: system.rate.evaluate(all) };
    }
  }
  return undefined;
}

// A system is solved many times (each observation, each perturbed concentration): its symbolic
// Jacobian is worked out once.
const jacobians = new WeakMap<NonlinearSystem, Polynomial[][]>();

function jacobianOf(system: NonlinearSystem): Polynomial[][] {
  let jacobian = jacobians.get(system);
  if (!jacobian) {
    jacobian = system.equations.map((eq) => system.unknowns.map((u) => eq.derivative(u)));
    jacobians.set(system, jacobian);
  }
  return jacobian;
}

function newton(
  equations: Polynomial[],
  jacobian: Polynomial[][],
  unknowns: string[],
  values: ReadonlyMap<string, number>,
  z: number[],
): boolean {
  const at = () => new Map([...values, ...unknowns.map((u, i): [string, number] => [u, Math.exp(z[i]!)])]);
  let point = at();
  let residual = scaledResidual(equations, point);
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    if (norm(residual.scaled) < 1e-11) return true;
    // d f/d z = d f/d x · x, since x = e^z.
    const J = jacobian.map((row) => row.map((d, j) => d.evaluate(point) * Math.exp(z[j]!)));
    const step = solveDense(
      J,
      residual.raw.map((r) => -r),
    );
    if (!step) return false;
    let damping = 1;
    const before = norm(residual.scaled);
    for (;;) {
      const trial = z.map((zi, i) => zi + damping * Math.max(-5, Math.min(5, step[i]!)));
      const trialPoint = new Map([...values, ...unknowns.map((u, i): [string, number] => [u, Math.exp(trial[i]!)])]);
      const trialResidual = scaledResidual(equations, trialPoint);
      if (norm(trialResidual.scaled) < before || damping < 1e-4) {
        trial.forEach((t, i) => (z[i] = t));
        point = trialPoint;
        residual = trialResidual;
        break;
      }
      damping /= 2;
    }
    if (!z.every(Number.isFinite)) return false;
  }
  return norm(residual.scaled) < 1e-9;
}

/** Residuals, raw and relative to the size of their terms (so tiny rates still count as balanced only when they cancel). */
function scaledResidual(equations: Polynomial[], point: ReadonlyMap<string, number>) {
  const raw = equations.map((eq) => eq.evaluate(point));
  const scaled = equations.map((eq, i) => {
    const size = eq.terms.reduce((s, t) => s + Math.abs(t.coefficient.toNumber() * t.monomial.evaluate(point)), 0);
    return size === 0 ? 0 : raw[i]! / size;
  });
  return { raw, scaled };
}

function norm(v: number[]): number {
  return Math.max(0, ...v.map(Math.abs));
}
