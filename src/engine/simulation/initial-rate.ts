/**
 * The initial rate by full simulation. Definition used throughout mechatlas: integrate the
 * mass-action ODEs from the observation's starting concentrations (intermediates absent, a
 * catalyst all in its free form) until the overall reaction has advanced by 1 % of its maximum
 * extent — by then any fast transient (pre-equilibria settling, the steady state building up)
 * has long passed in a valid approximation — and read the rate of the overall reaction there,
 * r = (d[P]/dt)/ν_P, with the state at that moment (against which the rate laws are checked).
 * The initial rate itself is that rate extrapolated to zero conversion (extrapolate.ts) from
 * readings at about 1, 2, 3 and 4 % of the extent, so that a rate that changes with conversion
 * (autocatalysis, inhibition by a product, depletion of a reactant) gives the initial-rate
 * value and orders, as an experimentalist's initial slopes do.
 */
import { integrateStiff, type IntegrateOptions } from '../numeric/stiff-integrator.ts';
import { extrapolateToZero } from './extrapolate.ts';
import type { MassActionModel } from './mass-action-system.ts';

/** The fraction of the maximum extent at which the initial rate is read. */
export const CONVERSION_FOR_INITIAL_RATE = 0.01;
// Stated in the message below; change both together.
const LAST_TIME = 1e12;
const OUTPUTS_PER_DECADE = 8;
const COARSE_ABSOLUTE_TOLERANCE = 1e-14;
// Radicals and bound catalyst sit many decades below the reactants: the refined pass resolves
// each species relative to its own size along the coarse pass.
const RELATIVE_TO_OWN_SCALE = 1e-9;
/** Further readings, as multiples of the first extent: about 1, 2, 3 and 4 % (the cubic through them is extrapolated). */
const FURTHER_READINGS = [2, 3, 4];

export interface RateProbe {
  /** which species gives the overall rate, and its coefficient in the overall equation */
  product: number;
  coefficient: number;
  /** the largest extent the starting mixture allows, in M */
  maxExtent: number;
}

export type InitialRate =
  | {
      status: 'ok';
      /** the rate extrapolated to zero conversion, in M s^-1 (the reading's rate where no extrapolation can be made) */
      rate: number;
      /** the rate at the reading (1 % conversion), with the time and the state there */
      readingRate: number;
      time: number;
      state: Float64Array;
    }
  | { status: 'failed'; message: string };

/**
 * How the reading is placed: `grid` reads at the first of 40 even times within a log-spaced grid
 * of 8 a decade from 1e-9 s, the time and state that reports show and check the laws at; `free`
 * lets accuracy alone choose the steps and reads wherever a step passes 1 % (about a third fewer
 * steps), for runs of which only the extrapolated rate is used (the perturbed runs of the orders).
 */
export type ReadingPlacement = 'grid' | 'free';

/** Simulates until 1 % conversion, reads the rate and the state there, and extrapolates the rate to zero conversion. */
export function simulatedInitialRate(
  model: MassActionModel,
  y0: Float64Array,
  probe: RateProbe,
  placement: ReadingPlacement = 'grid',
): InitialRate {
  const target = CONVERSION_FOR_INITIAL_RATE * probe.maxExtent;
  const extent = (y: Float64Array) => (y[probe.product]! - y0[probe.product]!) / probe.coefficient;
  const onGrid = placement === 'grid';
  const coarse = integrateStiff(model.system, y0, {
    tEnd: LAST_TIME,
    ...(onGrid ? { outputTimes: logTimes(1e-9, LAST_TIME) } : {}),
    rtol: 1e-7,
    atol: COARSE_ABSOLUTE_TOLERANCE * Math.max(1, probe.maxExtent),
    nonNegative: true,
    maxSteps: 50_000,
    // Nothing past the output where the target is passed is used: stop there.
    until: (_t, y) => extent(y) >= target,
  });
  const hit = coarse.y.findIndex((y) => extent(y) >= target);
  if (hit < 0) {
    if (coarse.status !== 'ok') return { status: 'failed', message: coarse.message ?? coarse.status };
    const reached = extent(coarse.y.at(-1) ?? y0) / probe.maxExtent;
    const message =
      reached <= 0
        ? 'the overall reaction does not run forwards from these concentrations (a species it needs may be absent, or the mixture may be past equilibrium)'
        : `the reaction reaches only ${(reached * 100).toPrecision(2)} % of its extent within 1e12 s (about 30 000 years), short of the ${CONVERSION_FOR_INITIAL_RATE * 100} % at which the initial rate is read`;
    return { status: 'failed', message };
  }
  const t0 = hit === 0 ? 0 : coarse.t[hit - 1]!;
  const start = hit === 0 ? y0 : coarse.y[hit - 1]!;
  const fine = Array.from({ length: 40 }, (_, i) => t0 + ((coarse.t[hit]! - t0) * (i + 1)) / 40);
  const atol = ownScaleTolerance([y0, ...coarse.y.slice(0, hit + 1)], probe.maxExtent);
  const refined = integrateStiff(model.system, start, {
    t0,
    tEnd: fine.at(-1)!,
    ...(onGrid ? { outputTimes: fine } : {}),
    rtol: 1e-8,
    atol,
    nonNegative: true,
    maxSteps: 50_000,
    until: (_t, y) => extent(y) >= target,
  });
  const at = refined.y.findIndex((y) => extent(y) >= target);
  const index = at < 0 ? refined.y.length - 1 : at;
  const state = refined.y[index] ?? coarse.y[hit]!;
  const time = refined.t[index] ?? coarse.t[hit]!;
  const rateAt = (t: number, y: Float64Array) => {
    const dydt = new Float64Array(y.length);
    model.system.rhs(t, y, dydt);
    return dydt[probe.product]! / probe.coefficient;
  };
  const readingRate = rateAt(time, state);
  const readings = [{ extent: extent(state), rate: readingRate }];
  // Later readings at the times the reading's rate would reach 2, 3 and 4 % of the extent: wherever
  // the extents really fall, they are distinct and small, which is all the extrapolation needs.
  if (readingRate > 0) {
    const times = FURTHER_READINGS.map((m) => time + ((m - 1) * target) / readingRate);
    const further = integrateStiff(model.system, state, {
      t0: time,
      tEnd: times.at(-1)!,
      outputTimes: times,
      rtol: 1e-8,
      atol,
      nonNegative: true,
      maxSteps: 50_000,
    } satisfies IntegrateOptions);
    if (further.status === 'ok')
      further.t.forEach((t, k) => readings.push({ extent: extent(further.y[k]!), rate: rateAt(t, further.y[k]!) }));
  }
  const initial = readings.length > FURTHER_READINGS.length ? extrapolateToZero(readings) : undefined;
  const rate = initial !== undefined && initial > 0 && Number.isFinite(initial) ? initial : readingRate;
  return { status: 'ok', rate, readingRate, time, state };
}

/** Absolute tolerance per species: a small fraction of the largest value it reached. */
function ownScaleTolerance(states: readonly Float64Array[], maxExtent: number): Float64Array {
  const atol = new Float64Array(states[0]!.length);
  for (let i = 0; i < atol.length; i++) {
    let scale = 0;
    for (const y of states) scale = Math.max(scale, Math.abs(y[i]!));
    atol[i] = Math.max(RELATIVE_TO_OWN_SCALE * scale, 1e-30 * maxExtent, Number.MIN_VALUE);
  }
  return atol;
}

function logTimes(first: number, last: number): number[] {
  const out: number[] = [];
  const decades = Math.log10(last / first);
  for (let i = 0; i <= decades * OUTPUTS_PER_DECADE; i++) out.push(first * 10 ** (i / OUTPUTS_PER_DECADE));
  return out;
}
