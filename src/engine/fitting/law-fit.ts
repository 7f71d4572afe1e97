/**
 * One rival's rate law fitted to an initial-rate table: nonlinear least squares on ln r over the
 * law's apparent constants (k_obs, K_A …), each fitted as its logarithm so it stays positive.
 * Fitting ln r weighs every rate by its relative error, which is how rates measured by IR, UV or
 * NMR scatter (common practice); with per-point uncertainties u the weights are (r/u)². Rivals
 * fitted to the same table with the same weights can then be compared by their criteria.
 */
import type { FitIssue } from './fitted-parameter.ts';
import { leastSquaresCriteria, type InformationCriteria } from './information-criteria.ts';
import type { InitialRateData } from './kinetic-data.ts';
import type { LawFunction } from './law-function.ts';
import type { NonlinearFit } from './nonlinear-fit.ts';
import { fitNonlinear } from './nonlinear-least-squares.ts';

/** A law fitted to one data set. */
export interface LawFit {
  fit: NonlinearFit;
  criteria: InformationCriteria;
  /** the law's rate at each point with the fitted constants (M s^-1, or M for a time course's first species) */
  predicted: number[];
}

/** Where every concentration symbol of the law comes from, point by point. */
export type PointConcentrations = ReadonlyMap<string, number>[];

/** The concentrations by symbol at each point: the table's columns over the observation's fixed conditions. */
export function pointConcentrations(
  data: InitialRateData,
  fixed: ReadonlyMap<string, number>,
  symbolOf: (species: string) => string | undefined,
): PointConcentrations {
  return data.concentrations.map((row) => {
    const values = new Map(fixed);
    data.species.forEach((sp, j) => {
      const symbol = symbolOf(sp);
      if (symbol) values.set(symbol, row[j]!);
    });
    return values;
  });
}

/** The law's symbols no point gives a concentration for. */
export function missingSymbols(law: LawFunction, points: PointConcentrations): string[] {
  return law.symbols.filter((s) => points.some((p) => !Number.isFinite(p.get(s))));
}

/** Fits the law's apparent constants; `start` gives known values (the record's constants) by name. */
export function fitLawToRates(
  law: LawFunction,
  data: InitialRateData,
  points: PointConcentrations,
  start: ReadonlyMap<string, number>,
): LawFit | { issue: FitIssue } {
  const y = data.rates.map(Math.log);
  const u = data.rateUncertainties;
  const weights = u ? data.rates.map((r, i) => (r / u[i]!) ** 2) : undefined;
  const initial = startingValues(law, data, points, start);
  const parameters = law.constants.map((name, j) => ({ name, initial: initial[j]!, positive: true }));
  const model = (values: readonly number[]) => points.map((c) => Math.log(law.rate(values, c)));
  const fit = fitNonlinear({ parameters, model, y, ...(weights ? { weights } : {}) }, { maxIterations: 600 });
  if (!fit.parameters.every((p) => Number.isFinite(p.value)))
    return { issue: { kind: 'model-failed', message: 'the law cannot be evaluated at these points' } };
  const values = fit.parameters.map((p) => p.value);
  return {
    fit,
    criteria: leastSquaresCriteria(fit.rss, fit.n, parameters.length),
    predicted: points.map((c) => law.rate(values, c)),
  };
}

/**
 * Starting values: a known value where the record gives one; otherwise each K from the middle of
 * the concentrations it multiplies (so its term is about 1 there), then the leading constant from
 * the geometric mean of the rates over the law's shape. The leading constant is scaled to the data
 * in any case, so a record's value in other conditions never starts the fit far off.
 */
function startingValues(
  law: LawFunction,
  data: InitialRateData,
  points: PointConcentrations,
  start: ReadonlyMap<string, number>,
): number[] {
  const values = law.constants.map((name) => {
    const known = start.get(name);
    return known !== undefined && known > 0 && Number.isFinite(known) ? known : NaN;
  });
  const middle = geometricMean(points.flatMap((p) => [...p.values()].filter((v) => v > 0)));
  for (let j = 1; j < values.length; j++) if (Number.isNaN(values[j]!)) values[j] = 1 / (middle || 1);
  values[0] = 1;
  const shape = points.map((c) => law.rate(values, c));
  const scale = geometricMean(data.rates.map((r, i) => r / shape[i]!));
  values[0] = Number.isFinite(scale) && scale > 0 ? scale : 1;
  return values;
}

function geometricMean(xs: readonly number[]): number {
  const logs = xs.filter((x) => x > 0 && Number.isFinite(x)).map(Math.log);
  return logs.length === 0 ? NaN : Math.exp(logs.reduce((a, b) => a + b, 0) / logs.length);
}
