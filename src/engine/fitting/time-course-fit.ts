/**
 * A time course fitted two ways. First the closed-form law, integrated along the overall
 * reaction's extent (d ξ/dt = r, every concentration following from ξ by the overall
 * stoichiometry): cheap, and it fits the same apparent constants as initial rates. Then the full
 * mass-action simulation (the stiff integrator) over the elementary constants the data determine:
 * started from the closed-form constants (elementary values chosen to reproduce them, nearest the
 * record's own), with the constants the data cannot see held at their start (found from the
 * sensitivities before fitting). Both are bounded by iteration counts, never by the clock.
 */
import type { Mechanism } from '../mechanism/mechanism.ts';
import { massActionModel } from '../simulation/mass-action-system.ts';
import { integrateStiff } from '../numeric/stiff-integrator.ts';
import type { RationalFunction } from '../exact/index.ts';
import { forwardConstant, reverseConstant, equilibriumConstant } from '../rate-law/symbols.ts';
import type { FitIssue } from './fitted-parameter.ts';
import { leastSquaresCriteria, type InformationCriteria } from './information-criteria.ts';
import type { TimeCourseData } from './kinetic-data.ts';
import type { LawFunction } from './law-function.ts';
import type { NonlinearFit } from './nonlinear-fit.ts';
import { fitNonlinear } from './nonlinear-least-squares.ts';
import { determinedParameters } from './determined-parameters.ts';
import { unreliableReasons } from './time-course-reliability.ts';

/** One model's fit to a time course, with its curves at the measured times. */
export interface TimeCourseModelFit {
  fit: NonlinearFit;
  criteria: InformationCriteria;
  /** per measured species, the model's concentration at each time / M */
  curves: number[][];
  /** why the fit is not to be trusted (not converged, a constant unbounded, a misfit); absent when it stands */
  unreliable?: string[];
}

/** The two fits of one time course. */
export interface TimeCourseFit {
  closedForm?: TimeCourseModelFit & { fixed: { name: string; value: number }[] };
  simulation?: TimeCourseModelFit & { fixed: { name: string; value: number }[] };
  issues: FitIssue[];
}

/** What the time-course fit needs from the record and its derivation. */
export interface TimeCourseInput {
  data: TimeCourseData;
  /** starting concentrations by species / M */
  start: ReadonlyMap<string, number>;
  /** the overall reaction: species → signed coefficient (reactants negative) */
  stoichiometry: ReadonlyMap<string, number>;
  /** the primary law with its constants' definitions and known values */
  law?: {
    fn: LawFunction;
    definitions: ReadonlyMap<string, RationalFunction>;
    known: ReadonlyMap<string, number>;
    /** concentration symbols held for the whole run (a catalyst total) / M */
    fixed: ReadonlyMap<string, number>;
    symbolOf: (species: string) => string | undefined;
  };
  mechanism: Mechanism;
  /** the record's elementary constants by symbol (k_1, k_-1, K_1) */
  constants: ReadonlyMap<string, number>;
  /** species held at constant concentration (buffered, solvent) */
  held: ReadonlySet<string>;
}

const SUBSTEPS = 20;
// Iterations between convergence checks: each costs an integration per parameter, so a fit already
// at its minimum (the simulation started from the closed form's constants) stops after a few.
const ROUND = 5;
const WINDOW = 1e3;
// The integrator's tolerances: relative 1e-6 and absolute 1e-8 of the largest starting
// concentration, far below any measured noise; tighter ones only slow every fit (1.2 s against
// 20 s for the demo progress curve) without moving the constants.
const RTOL = 1e-6;
const ATOL = 1e-8;

/** Fits the closed-form law and the mass-action simulation to a time course. */
export function fitTimeCourse(input: TimeCourseInput, maxIterations = 60): TimeCourseFit {
  const { data } = input;
  const issues: FitIssue[] = [];
  const { y, weights, slots } = flatten(data);
  const out: TimeCourseFit = { issues };
  let apparent: Map<string, number> | undefined;
  if (input.law) {
    const law = input.law;
    const curvesOf = (values: readonly number[]) => integrateLaw(input, law, values);
    const initial = law.fn.constants.map((c) => law.known.get(c) ?? NaN);
    if (initial.every((v) => v > 0 && Number.isFinite(v))) {
      // A constant the curves cannot tell from the others (K_I with [I] held all run long: it
      // only rescales k_obs and K_S) is held at its start, or the fit wanders along the ridge.
      const names = law.fn.constants;
      const free = determinedParameters(names, initial, (v) => pick(curvesOf(v), slots));
      const valuesOf = (x: readonly number[]) =>
        names.map((n, j) => (free.includes(n) ? x[free.indexOf(n)]! : initial[j]!));
      const parameters = free.map((name) => ({ name, initial: initial[names.indexOf(name)]!, positive: true }));
      const model = (x: readonly number[]) => pick(curvesOf(valuesOf(x)), slots);
      const fit = fitNonlinear({ parameters, model, y, ...(weights && { weights }) }, { maxIterations, round: ROUND });
      const values = valuesOf(fit.parameters.map((p) => p.value));
      out.closedForm = {
        fit,
        criteria: leastSquaresCriteria(fit.rss, fit.n, parameters.length),
        curves: curvesOf(values),
        fixed: names.flatMap((name, j) => (free.includes(name) ? [] : [{ name, value: initial[j]! }])),
        ...reliability(fit, weights !== undefined),
      };
      // Only what the closed form determined starts the simulation; the rest keep the record's values.
      const determined = fit.parameters.flatMap((p) =>
        fit.converged && p.identifiable ? [[p.name, p.value] as const] : [],
      );
      if (determined.length > 0) apparent = new Map(determined);
    } else issues.push({ kind: 'model-failed', message: 'the law has no starting constants (give the steps k and K)' });
  }
  // The closed form's scatter (when it converged) tells the simulation which constants the data can pin down.
  const closed = out.closedForm?.fit;
  const variance = closed?.converged && closed.dof >= 1 ? closed.rss / closed.dof : undefined;
  const simulated = fitSimulation(input, apparent, y, weights, slots, maxIterations, variance);
  if ('issue' in simulated) issues.push(simulated.issue);
  else out.simulation = simulated;
  return out;
}

function reliability(fit: NonlinearFit, weighted: boolean): { unreliable?: string[] } {
  const reasons = unreliableReasons(fit, weighted);
  return reasons.length > 0 ? { unreliable: reasons } : {};
}

/** The measured values in one vector, with where each came from (species j, point i). */
function flatten(data: TimeCourseData): { y: number[]; weights?: number[]; slots: [number, number][] } {
  const y: number[] = [];
  const w: number[] = [];
  const slots: [number, number][] = [];
  data.concentrations.forEach((row, i) =>
    row.forEach((c, j) => {
      if (c === undefined) return;
      y.push(c);
      slots.push([j, i]);
      const u = data.uncertainties?.[i]?.[j];
      w.push(u !== undefined && u > 0 ? 1 / (u * u) : NaN);
    }),
  );
  return w.every((x) => Number.isFinite(x)) ? { y, weights: w, slots } : { y, slots };
}

function pick(curves: readonly number[][], slots: readonly [number, number][]): number[] {
  return slots.map(([j, i]) => curves[j]?.[i] ?? NaN);
}

/** Concentrations of the measured species along the extent ξ, the law integrated by classical Runge–Kutta. */
function integrateLaw(
  input: TimeCourseInput,
  law: NonNullable<TimeCourseInput['law']>,
  values: readonly number[],
): number[][] {
  const { data, start, stoichiometry } = input;
  const species = [...stoichiometry.keys()];
  const symbols = species.map((s) => law.symbolOf(s));
  const concentrationsAt = (xi: number) => {
    const c = new Map(law.fixed);
    species.forEach((s, k) => {
      const symbol = symbols[k];
      if (symbol && !law.fixed.has(symbol))
        c.set(symbol, Math.max(0, (start.get(s) ?? 0) + stoichiometry.get(s)! * xi));
    });
    return c;
  };
  const rate = (xi: number) => {
    const r = law.fn.rate(values, concentrationsAt(xi));
    return Number.isFinite(r) ? r : 0;
  };
  const extents: number[] = [];
  let t = 0;
  let xi = 0;
  for (const target of data.times) {
    const h = (target - t) / SUBSTEPS;
    for (let s = 0; s < SUBSTEPS && h > 0; s++) {
      const k1 = rate(xi);
      const k2 = rate(xi + (h / 2) * k1);
      const k3 = rate(xi + (h / 2) * k2);
      const k4 = rate(xi + h * k3);
      xi += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    }
    t = Math.max(t, target);
    extents.push(xi);
  }
  return data.species.map((s) => extents.map((e) => (start.get(s) ?? 0) + (stoichiometry.get(s) ?? 0) * e));
}

/** The elementary constants as the simulation takes them: k of every step, k_- of each reversible one. */
function elementaryNames(mechanism: Mechanism): string[] {
  return mechanism.steps.flatMap((s) =>
    s.reversible ? [forwardConstant(s.label), reverseConstant(s.label)] : [forwardConstant(s.label)],
  );
}

/** Every named value a definition may use: the elementary constants and each step's K = k/k_-. */
function withEquilibria(mechanism: Mechanism, values: ReadonlyMap<string, number>): Map<string, number> {
  const all = new Map(values);
  for (const s of mechanism.steps)
    if (s.reversible)
      all.set(
        equilibriumConstant(s.label),
        values.get(forwardConstant(s.label))! / values.get(reverseConstant(s.label))!,
      );
  return all;
}

/** The record's elementary values (k_- from K where only K is given); undefined where a step has none. */
function recordElementary(input: TimeCourseInput): Map<string, number> | undefined {
  const out = new Map<string, number>();
  for (const s of input.mechanism.steps) {
    const k = input.constants.get(forwardConstant(s.label));
    if (!(k! > 0)) return undefined;
    out.set(forwardConstant(s.label), k!);
    if (!s.reversible) continue;
    const K = input.constants.get(equilibriumConstant(s.label));
    const kr = input.constants.get(reverseConstant(s.label)) ?? (K! > 0 ? k! / K! : undefined);
    if (!(kr! > 0)) return undefined;
    out.set(reverseConstant(s.label), kr!);
  }
  return out;
}

/**
 * Elementary values that reproduce the closed-form fit's apparent constants, nearest the record's
 * own on the log scale (a small least-squares problem: the apparent constants exactly, the
 * record's values weakly, since many elementary sets give the same apparent ones).
 */
function elementaryStart(
  input: TimeCourseInput,
  names: readonly string[],
  record: ReadonlyMap<string, number>,
  apparent: ReadonlyMap<string, number> | undefined,
): Map<string, number> {
  const definitions = [...(input.law?.definitions ?? [])].filter(([name]) => apparent?.has(name));
  if (definitions.length === 0) return new Map(record);
  const prior = 1e-3;
  const parameters = names.map((name) => ({ name, initial: record.get(name)!, positive: true }));
  const model = (values: readonly number[]) => {
    const all = withEquilibria(input.mechanism, new Map(names.map((n, j) => [n, values[j]!])));
    return [...definitions.map(([, d]) => Math.log(d.evaluate(all))), ...values.map((v) => prior * Math.log(v))];
  };
  const y = [
    ...definitions.map(([name]) => Math.log(apparent!.get(name)!)),
    ...names.map((n) => prior * Math.log(record.get(n)!)),
  ];
  const fit = fitNonlinear({ parameters, model, y }, { maxIterations: 200 });
  const ok = fit.parameters.every((p) => Number.isFinite(p.value) && p.value > 0);
  return ok ? new Map(names.map((n, j) => [n, fit.parameters[j]!.value])) : new Map(record);
}

function fitSimulation(
  input: TimeCourseInput,
  apparent: ReadonlyMap<string, number> | undefined,
  y: readonly number[],
  weights: readonly number[] | undefined,
  slots: readonly [number, number][],
  maxIterations: number,
  variance: number | undefined,
): (TimeCourseModelFit & { fixed: { name: string; value: number }[] }) | { issue: FitIssue } {
  const { mechanism, data } = input;
  const record = recordElementary(input);
  if (!record)
    return {
      issue: { kind: 'model-failed', message: 'the simulation needs every step’s rate constants to start from' },
    };
  const names = elementaryNames(mechanism);
  const start = elementaryStart(input, names, record, apparent);
  const species = [...mechanism.species.keys()];
  const measured = data.species.map((s) => species.indexOf(s));
  const y0 = new Float64Array(species.length);
  species.forEach((s, i) => (y0[i] = input.start.get(s) ?? 0));
  const tEnd = Math.max(...data.times);
  const curvesOf = (values: ReadonlyMap<string, number>): number[][] => {
    const forward = mechanism.steps.map((s) => values.get(forwardConstant(s.label))!);
    const reverse = mechanism.steps.map((s) => (s.reversible ? values.get(reverseConstant(s.label))! : 0));
    const model = massActionModel(mechanism, { forward, reverse }, input.held);
    const scale = Math.max(...y0, 1e-300);
    const run = integrateStiff(model.system, y0, {
      tEnd,
      outputTimes: data.times,
      rtol: RTOL,
      atol: ATOL * scale,
      nonNegative: true,
      maxSteps: 5_000,
    });
    if (run.status !== 'ok') return measured.map(() => data.times.map(() => NaN));
    const at = new Map(run.t.map((t, k) => [t, run.y[k]!]));
    return measured.map((i) => data.times.map((t) => at.get(t)?.[i] ?? NaN));
  };
  // Each constant stays within a factor of WINDOW of its start: a constant running off to 1e19
  // (one the data barely feel) would make every later integration stiff and slow.
  const valuesOf = (free: readonly string[], x: readonly number[]) => {
    const all = new Map(start);
    free.forEach((n, j) => {
      const s0 = start.get(n)!;
      all.set(n, Math.min(s0 * WINDOW, Math.max(s0 / WINDOW, x[j]!)));
    });
    return all;
  };
  const modelOf = (free: readonly string[]) => (x: readonly number[]) => pick(curvesOf(valuesOf(free, x)), slots);
  const root = weights?.map(Math.sqrt);
  const free = determinedParameters(
    names,
    names.map((n) => start.get(n)!),
    (x) => modelOf(names)(x).map((v, i) => v * (root?.[i] ?? 1)),
    variance,
  );
  if (free.length === 0)
    return { issue: { kind: 'not-identifiable', message: 'the time course is not sensitive to any rate constant' } };
  const parameters = free.map((name) => ({ name, initial: start.get(name)!, positive: true }));
  const fit = fitNonlinear(
    { parameters, model: modelOf(free), y, ...(weights && { weights }) },
    { maxIterations, differenceStep: 1e-4, round: ROUND },
  );
  const fitted = valuesOf(
    free,
    fit.parameters.map((p) => p.value),
  );
  // A constant held at the edge of its window is not bounded by the data: say so.
  const edge = (name: string, value: number) => {
    const s0 = start.get(name)!;
    return value >= s0 * WINDOW * 0.999 || value <= (s0 / WINDOW) * 1.001;
  };
  fit.parameters.forEach((p, j) => {
    if (!edge(p.name, p.value)) return;
    const note = `it ran to the edge of its search window (×${WINDOW} of its start): the data do not bound it`;
    const clamped = fitted.get(free[j]!)!;
    fit.parameters[j] = { ...p, value: clamped, identifiable: false, identifiabilityNote: note };
  });
  return {
    fit,
    criteria: leastSquaresCriteria(fit.rss, fit.n, parameters.length),
    curves: curvesOf(fitted),
    ...reliability(fit, weights !== undefined),
    fixed: names.filter((n) => !free.includes(n)).map((name) => ({ name, value: start.get(name)! })),
  };
}
