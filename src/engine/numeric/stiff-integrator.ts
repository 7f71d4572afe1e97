/**
 * Adaptive integration of stiff mass-action kinetics: fast pre-equilibria beside slow steps,
 * rate-constant ratios of 1e12 and time spans of 1e11. An L-stable Rosenbrock method of order 3
 * (rosenbrock-method.ts) with an analytic Jacobian takes steps as large as accuracy allows, since
 * stability never limits them; failures come back as a status and a message, never as a throw.
 */
import type { OdeSystem } from './ode-system.ts';
import { ROSENBROCK_TABLEAU } from './rosenbrock-method.ts';
import { createWorkspace, rosenbrockStep } from './rosenbrock-step.ts';
import { errorNorm, initialStep, stepFactor, type Tolerances } from './step-control.ts';

export type { OdeSystem };

/** Span, tolerances (defaults rtol 1e-6, atol 1e-12), step budget (100 000) and output times. */
export interface IntegrateOptions {
  t0?: number;
  tEnd: number;
  rtol?: number;
  atol?: number | Float64Array;
  maxSteps?: number;
  initialStep?: number;
  /** Times in [t0, tEnd] to report, reached by stepping to each exactly; without them every accepted step is reported. */
  outputTimes?: readonly number[];
  /** Clip small negative overshoots at accepted steps; larger ones make the step be rejected. */
  nonNegative?: boolean;
  /**
   * Ends the integration at the first reported point (an output time, or an accepted step when there are none)
   * where it holds: the caller's target (an extent of reaction) is reached, and nothing past it is computed.
   */
  until?: (t: number, y: Float64Array) => boolean;
}

/** How the integration ended, the reported solution, and work counters (steps = accepted steps). */
export interface IntegrateResult {
  status: 'ok' | 'max-steps' | 'step-too-small' | 'non-finite';
  message?: string;
  /** true when `until` ended the integration before tEnd, at the last reported point */
  stopped?: boolean;
  t: number[];
  y: Float64Array[];
  steps: number;
  rejected: number;
  jacobianEvaluations: number;
  /** linear solves of the stages: by refined doubles, and in double-double (near-singular iteration matrices) */
  solves: { refined: number; extended: number };
}

/** Integrates y' = f(t, y) from t0 to tEnd with error control; a misuse of the API (sizes, tEnd < t0) throws. */
export function integrateStiff(system: OdeSystem, y0: Float64Array, options: IntegrateOptions): IntegrateResult {
  const n = system.size;
  const t0 = options.t0 ?? 0;
  const { tEnd } = options;
  if (y0.length !== n) throw new RangeError(`y0 has ${y0.length} components, the system ${n}`);
  if (tEnd < t0) throw new RangeError(`tEnd (${tEnd}) is before t0 (${t0})`);
  const tol = resolveTolerances(options, n);
  const maxSteps = options.maxSteps ?? 100_000;
  const nonNegative = options.nonNegative ?? false;
  const outputs = options.outputTimes?.filter((s) => s >= t0 && s <= tEnd).sort((a, b) => a - b);
  const result: IntegrateResult = {
    status: 'ok',
    t: [],
    y: [],
    steps: 0,
    rejected: 0,
    jacobianEvaluations: 0,
    solves: { refined: 0, extended: 0 },
  };
  const stop = (status: IntegrateResult['status'], message: string) => ({ ...result, status, message });

  let t = t0;
  let y = Float64Array.from(y0);
  let nextOutput = 0;
  const until = options.until;
  /** Records the points reached; true when `until` holds at one of them (the integration ends there). */
  const report = (): boolean => {
    if (!outputs) {
      result.t.push(t);
      result.y.push(Float64Array.from(y));
      return until !== undefined && until(t, y);
    }
    for (; nextOutput < outputs.length && outputs[nextOutput]! <= t; nextOutput++) {
      result.t.push(outputs[nextOutput]!);
      result.y.push(Float64Array.from(y));
      if (until !== undefined && until(outputs[nextOutput]!, y)) return true;
    }
    return false;
  };
  if (!Number.isFinite(t0) || !Number.isFinite(tEnd))
    return stop('non-finite', `the time span ${t0} to ${tEnd} is not finite`);
  const badStart = firstNonFinite(y);
  if (badStart >= 0) return stop('non-finite', `the initial value of component ${badStart} is not finite`);
  const f0 = new Float64Array(n);
  system.rhs(t, y, f0);
  const badRate = firstNonFinite(f0);
  if (badRate >= 0)
    return stop('non-finite', `the right-hand side of component ${badRate} is not finite at t = ${fmt(t)}`);
  if (report()) return { ...result, stopped: true };

  const span = tEnd - t0;
  const embeddedOrder = ROSENBROCK_TABLEAU.embeddedOrder;
  const given = options.initialStep;
  const estimate = () =>
    span > 0 ? initialStep(y, f0, t0, span, ROSENBROCK_TABLEAU.order, tol, (s, v, d) => system.rhs(s, v, d)) : 0;
  let h = Math.min(span, given !== undefined && given > 0 ? given : estimate());
  const ws = createWorkspace(n);
  // The counters are the workspace's own, read through the result.
  result.solves = ws.lu.counts;
  const jacobian = new Float64Array(n * n);
  let y1 = new Float64Array(n);
  const err = new Float64Array(n);
  let jacobianCurrent = false;
  let afterRejection = false;
  let lastFailure: 'error' | 'singular' | 'non-finite' = 'error';

  while (t < tEnd) {
    if (result.steps + result.rejected >= maxSteps) {
      return stop(
        'max-steps',
        `the integration needed more than ${maxSteps} steps before t = ${fmt(tEnd)}; it stopped at t = ${fmt(t)}`,
      );
    }
    const target = outputs && nextOutput < outputs.length ? outputs[nextOutput]! : tEnd;
    const remaining = target - t;
    // Step onto the target exactly; when just short of it, split the rest rather than leave a sliver.
    const hTry = h >= remaining ? remaining : h > remaining / 2 ? remaining / 2 : h;
    if (!(hTry >= 10 * Number.EPSILON * Math.max(Math.abs(t), 1e-290))) {
      return lastFailure === 'non-finite'
        ? stop('non-finite', `the solution becomes non-finite just after t = ${fmt(t)}, however small the step`)
        : stop(
            'step-too-small',
            `the step size fell to ${fmt(hTry)} at t = ${fmt(t)}${lastFailure === 'singular' ? ' (singular iteration matrix)' : ''}`,
          );
    }
    if (!jacobianCurrent) {
      system.jacobian(t, y, jacobian);
      result.jacobianEvaluations++;
      const bad = firstNonFinite(jacobian);
      if (bad >= 0)
        return stop(
          'non-finite',
          `the Jacobian entry (${Math.floor(bad / n)}, ${bad % n}) is not finite at t = ${fmt(t)}`,
        );
      jacobianCurrent = true;
    }
    const outcome = rosenbrockStep(system, t, hTry, y, f0, jacobian, y1, err, ws);
    const norm = outcome === 'ok' ? errorNorm(err, y, y1, tol, nonNegative) : Infinity;
    if (!(norm <= 1)) {
      // Rejected: the same point, so the Jacobian stays; a failed solve shrinks the step hard.
      result.rejected++;
      lastFailure = outcome === 'ok' ? 'error' : outcome;
      h = outcome === 'ok' ? hTry * stepFactor(norm, embeddedOrder, true) : hTry / 4;
      afterRejection = true;
      continue;
    }
    t = hTry === remaining ? target : t + hTry;
    [y, y1] = [y1, y];
    if (nonNegative) for (let i = 0; i < n; i++) if (y[i]! < 0) y[i] = 0;
    result.steps++;
    jacobianCurrent = false;
    system.rhs(t, y, f0);
    const bad = firstNonFinite(f0);
    if (bad >= 0) return stop('non-finite', `the right-hand side of component ${bad} is not finite at t = ${fmt(t)}`);
    const proposed = hTry * stepFactor(norm, embeddedOrder, afterRejection);
    // A step shortened to meet an output says nothing against the longer step planned before it.
    h = Math.min(span, hTry < h ? Math.max(proposed, h) : proposed);
    afterRejection = false;
    lastFailure = 'error';
    if (report()) return { ...result, stopped: true };
  }
  return result;
}

function resolveTolerances(options: IntegrateOptions, n: number): Tolerances {
  const atol = options.atol ?? 1e-12;
  if (typeof atol !== 'number' && atol.length !== n)
    throw new RangeError(`atol has ${atol.length} components, the system ${n}`);
  return { rtol: options.rtol ?? 1e-6, atol: typeof atol === 'number' ? new Float64Array(n).fill(atol) : atol };
}

function firstNonFinite(v: Float64Array): number {
  for (let i = 0; i < v.length; i++) if (!Number.isFinite(v[i]!)) return i;
  return -1;
}

function fmt(x: number): string {
  const rounded = Number(x.toPrecision(6));
  return Math.abs(x) >= 1e5 || (x !== 0 && Math.abs(x) < 1e-3) ? rounded.toExponential() : String(rounded);
}
