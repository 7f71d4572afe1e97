/**
 * Concentration–time series of one observation by full mass-action simulation, for the
 * concentration–time plot (DESIGN.md item 7). The span runs from well before the fastest
 * transient to the first round time (1, 2 or 5 × 10ⁿ s) by which the reaction has gone 99 % of
 * the way it goes — full conversion of the limiting reactant, or equilibrium — and at most
 * 200 × ξmax/r0 (the time full conversion would take at the initial rate; 99 % of a second-order
 * reaction needs 99 of them). Output times are log-spaced, so fast transients show on a log axis,
 * merged with evenly spaced ones, so a linear axis is smooth too, and start at t = 0.
 */
import type { Observation, Role } from '../../model/index.ts';
import { integrateStiff } from '../numeric/stiff-integrator.ts';
import { rememberedInitialRate } from './remembered-runs.ts';
import type { MassActionModel } from './mass-action-system.ts';
import { simulationSetup, type SimulationBasis } from './simulation-setup.ts';

/** Simulated concentrations of every species of one observation over time. */
export interface ConcentrationSeries {
  status: 'ok' | 'failed' | 'skipped';
  message?: string;
  observation?: string;
  unit: 'M';
  /** output times / s, increasing from 0 */
  times: number[];
  species: string[];
  /** the derived role of each species, where it has one */
  roles: (Role | undefined)[];
  /** whether each species is held at constant concentration (solvent, buffered) */
  held: boolean[];
  /** values[i][k]: concentration of species[i] at times[k] / M */
  values: number[][];
  /** fraction of the largest possible extent reached at the last time */
  conversion?: number;
  /** ξmax / r0 / s: the time full conversion would take at the initial rate */
  timescale?: number;
}

/** Output density and where the series stops. */
export interface SeriesOptions {
  /** log-spaced output times per decade (default 20) */
  outputsPerDecade?: number;
  /** evenly spaced output times over the span (default 100) */
  linearOutputs?: number;
  /** fraction of the final extent after which the series ends (default 0.99) */
  completion?: number;
}

const SPAN_IN_TIMESCALES = 200;
const LAST_TIME = 1e12;
const MAX_DECADES = 9;

/** Simulates one observation from t = 0 until the reaction is ~99 % complete. */
export function concentrationSeries(
  basis: SimulationBasis,
  constants: ReadonlyMap<string, number>,
  observation: Observation,
  options: SeriesOptions = {},
): ConcentrationSeries {
  const base = {
    observation: observation.id,
    unit: 'M' as const,
    times: [],
    species: [],
    roles: [],
    held: [],
    values: [],
  };
  const setup = simulationSetup(basis, constants, observation);
  if ('missing' in setup) return { ...base, status: 'skipped', message: `not simulated: needs ${setup.missing}` };
  const { model, y0, probe } = setup;
  // The check's run of this observation, when it made one.
  const initial = rememberedInitialRate(basis.mechanism, model, y0, probe);
  if (initial.status !== 'ok' || !(initial.rate > 0))
    return {
      ...base,
      status: 'failed',
      message: initial.status === 'ok' ? 'the simulated rate is not positive' : initial.message,
    };
  const timescale = probe.maxExtent / initial.rate;
  const cap = Math.min(LAST_TIME, SPAN_IN_TIMESCALES * timescale);
  const fastest = fastestRate(model, [y0, initial.state]);
  const extent = (y: Float64Array) => (y[probe.product]! - y0[probe.product]!) / probe.coefficient;
  const tolerances = { rtol: 1e-6, atol: 1e-14 * Math.max(1, probe.maxExtent), nonNegative: true, maxSteps: 50_000 };

  const coarseStart = firstTime(fastest, cap);
  const coarse = integrateStiff(model.system, y0, {
    tEnd: cap,
    outputTimes: logTimes(coarseStart, cap, 8),
    ...tolerances,
  });
  if (coarse.status !== 'ok') return { ...base, status: 'failed', message: coarse.message ?? coarse.status };
  const goal = (options.completion ?? 0.99) * Math.min(probe.maxExtent, extent(coarse.y[coarse.y.length - 1]!));
  const reached = coarse.t[coarse.y.findIndex((y) => extent(y) >= goal)] ?? cap;
  const tEnd = Math.min(roundUp(reached), cap);
  const start = firstTime(fastest, tEnd);
  const times = mergeTimes(logTimes(start, tEnd, options.outputsPerDecade ?? 20), options.linearOutputs ?? 100, tEnd);
  const fine = integrateStiff(model.system, y0, { tEnd, outputTimes: times, ...tolerances });
  if (fine.status !== 'ok') return { ...base, status: 'failed', message: fine.message ?? fine.status };
  const roles = basis.route.roles;
  return {
    ...base,
    status: 'ok',
    times: fine.t,
    species: [...model.species],
    roles: model.species.map((sp) => roles.get(sp)),
    held: model.species.map((sp) => setup.held.has(sp)),
    values: model.species.map((_, i) => fine.y.map((y) => y[i]!)),
    conversion: extent(fine.y[fine.y.length - 1]!) / probe.maxExtent,
    timescale,
  };
}

/** The series of the record's first observation that can be simulated (constants and concentrations complete). */
export function firstObservationSeries(
  observations: readonly Observation[],
  basis: SimulationBasis,
  constants: ReadonlyMap<string, number>,
  options: SeriesOptions = {},
): ConcentrationSeries | undefined {
  if (observations.length === 0) return undefined;
  const usable = observations.find((o) => !('missing' in simulationSetup(basis, constants, o))) ?? observations[0]!;
  return concentrationSeries(basis, constants, usable, options);
}

/** The largest first-order loss rate (|∂f_i/∂y_i|) at any of the states: 1/it is the fastest transient. */
function fastestRate(model: MassActionModel, states: Float64Array[]): number {
  const n = model.system.size;
  const J = new Float64Array(n * n);
  let fastest = 0;
  for (const y of states) {
    model.system.jacobian(0, y, J);
    for (let i = 0; i < n; i++) fastest = Math.max(fastest, Math.abs(J[i * n + i]!));
  }
  return fastest;
}

/** A power of ten well before the fastest transient (2 % of its time constant), keeping 3 to 9 decades below the end. */
function firstTime(fastest: number, end: number): number {
  const wanted = fastest > 0 ? 0.02 / fastest : end * 1e-3;
  const clamped = Math.min(end * 1e-3, Math.max(end * 10 ** -MAX_DECADES, wanted));
  return decade(Math.floor(Math.log10(clamped)));
}

/** 10ⁿ exactly as written (10 ** -5 is 0.000009999999999999999 in floating point). */
function decade(n: number): number {
  return Number(`1e${n}`);
}

function logTimes(first: number, last: number, perDecade: number): number[] {
  const out: number[] = [];
  const steps = Math.ceil(Math.log10(last / first) * perDecade);
  for (let i = 0; i < steps; i++) out.push(Number((first * 10 ** (i / perDecade)).toPrecision(12)));
  out.push(last);
  return out;
}

function mergeTimes(logSpaced: number[], count: number, end: number): number[] {
  const linear = Array.from({ length: count }, (_, k) => (end * (k + 1)) / count);
  const all = [0, ...logSpaced, ...linear].sort((a, b) => a - b);
  return all.filter((t, i) => i === 0 || t - all[i - 1]! > 1e-9 * t);
}

/** The smallest 1, 2 or 5 × 10ⁿ at or above t. */
function roundUp(t: number): number {
  const n = Math.floor(Math.log10(t));
  return [1, 2, 5, 10].map((m) => Number(`${m}e${n}`)).find((v) => v >= t * (1 - 1e-12)) ?? decade(n + 1);
}
