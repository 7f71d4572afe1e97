/**
 * Error measurement and step-size selection for the adaptive integrator, following the standard
 * practice described in Hairer, Nørsett & Wanner, Solving Ordinary Differential Equations I,
 * section II.4 (from memory): a weighted root-mean-square norm mixing relative and absolute
 * tolerances, an asymptotic controller with a safety factor, and an initial step from two probes.
 */

/** Tolerances resolved to one absolute tolerance per component. */
export interface Tolerances {
  rtol: number;
  atol: Float64Array;
}

/** Safety factor and limits on how fast the step may change (common practice). */
export const CONTROLLER = { safety: 0.9, minFactor: 0.2, maxFactor: 5 } as const;

/**
 * RMS of err_i / (atol_i + rtol·max(|y0_i|, |y1_i|)); 1 means "exactly at tolerance". With
 * nonNegative, a negative y1_i counts as an error of its own size, so that a step producing an
 * overshoot beyond the tolerance is rejected rather than clipped.
 */
export function errorNorm(
  err: Float64Array,
  y0: Float64Array,
  y1: Float64Array,
  tol: Tolerances,
  nonNegative: boolean,
): number {
  let sum = 0;
  let worstNegative = 0;
  for (let i = 0; i < err.length; i++) {
    const scale = tol.atol[i]! + tol.rtol * Math.max(Math.abs(y0[i]!), Math.abs(y1[i]!));
    const ratio = err[i]! / scale;
    sum += ratio * ratio;
    if (nonNegative && y1[i]! < 0) {
      worstNegative = Math.max(worstNegative, -y1[i]! / (tol.atol[i]! + tol.rtol * Math.abs(y0[i]!)));
    }
  }
  const rms = err.length === 0 ? 0 : Math.sqrt(sum / err.length);
  return Math.max(rms, worstNegative);
}

/** The factor for the next step from this step's error norm, for an error estimate of order q + 1. */
export function stepFactor(norm: number, embeddedOrder: number, afterRejection: boolean): number {
  const maxFactor = afterRejection ? 1 : CONTROLLER.maxFactor;
  if (norm === 0) return maxFactor;
  const factor = CONTROLLER.safety * norm ** (-1 / (embeddedOrder + 1));
  return Math.min(maxFactor, Math.max(CONTROLLER.minFactor, factor));
}

/**
 * A starting step from the sizes of y, f and an estimate of y'' (an explicit Euler probe), as in
 * Hairer, Nørsett & Wanner I, section II.4; capped by the span. `probe` evaluates f at a point.
 */
export function initialStep(
  y0: Float64Array,
  f0: Float64Array,
  t0: number,
  span: number,
  order: number,
  tol: Tolerances,
  probe: (t: number, y: Float64Array, dydt: Float64Array) => void,
): number {
  const n = y0.length;
  const scale = (i: number) => tol.atol[i]! + tol.rtol * Math.abs(y0[i]!);
  const rms = (v: (i: number) => number) => {
    let s = 0;
    for (let i = 0; i < n; i++) s += (v(i) / scale(i)) ** 2;
    return n === 0 ? 0 : Math.sqrt(s / n);
  };
  const d0 = rms((i) => y0[i]!);
  const d1 = rms((i) => f0[i]!);
  // With nothing present or nothing happening there is no scale to read; start small, not blind.
  const tiny = 1e-6 * Math.min(1, span);
  let h0 = d0 < 1e-5 || d1 < 1e-5 ? tiny : (0.01 * d0) / d1;
  h0 = Math.min(h0, span);
  const y1 = new Float64Array(n);
  for (let i = 0; i < n; i++) y1[i] = y0[i]! + h0 * f0[i]!;
  const f1 = new Float64Array(n);
  probe(t0 + h0, y1, f1);
  const d2 = rms((i) => f1[i]! - f0[i]!) / h0;
  // A non-finite probe (the Euler step overshot into nonsense) leaves the first guess standing.
  if (!Number.isFinite(d2)) return h0;
  const d = Math.max(d1, d2);
  const h1 = d <= 1e-15 ? Math.max(tiny, h0 * 1e-3) : (0.01 / d) ** (1 / (order + 1));
  return Math.min(100 * h0, h1, span);
}
