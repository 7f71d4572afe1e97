/**
 * Reaction orders from an initial-rate table: a weighted linear least-squares fit of
 * ln r = ln k_app + Σ nⱼ ln[Xⱼ] over all varied species at once (varying one species at a time
 * and fitting each separately wastes the other points and ignores their covariance). Species held
 * at one concentration throughout are reported as held, not fitted: their orders are folded into
 * k_app and cannot be found from these data.
 */
import type { FitIssue, FittedParameter } from './fitted-parameter.ts';
import { linearLeastSquares, type LinearFit, type Weighting } from './linear-least-squares.ts';

/** An initial-rate table in consistent units (the engine uses M and M s^-1). */
export interface InitialRateTable {
  /** species symbols, one per concentration column */
  species: readonly string[];
  /** one row per point, one concentration per species (all > 0) */
  concentrations: readonly (readonly number[])[];
  /** the initial rate of each point (> 0) */
  rates: readonly number[];
  /** standard uncertainty of each rate, in the rate's unit; weights (r/u)² on the log scale */
  rateUncertainties?: readonly number[];
}

/** The orders found and what they rest on. */
export interface OrderFit {
  /** one per varied species, named by its symbol */
  orders: FittedParameter[];
  /** ln of the apparent rate constant, in the units of the table (rate / concentration^Σn) */
  lnApparentConstant: FittedParameter;
  /** species held at one concentration: no order can be found for them */
  held: { species: string; concentration: number }[];
  /** the underlying fit (design columns: 1, then ln[X] of each varied species) */
  fit: LinearFit;
  issues: FitIssue[];
}

// Concentrations that agree to this relative spread are one concentration (a species held constant).
const SAME_CONCENTRATION = 1e-9;

/** Fits the orders of every varied species and ln k_app, with standard errors and 95 % intervals. */
export function fitInitialRateOrders(table: InitialRateTable, weighting: Weighting = 'relative'): OrderFit {
  const varied: number[] = [];
  const held: OrderFit['held'] = [];
  table.species.forEach((species, j) => {
    const column = table.concentrations.map((row) => row[j]!);
    const [low, high] = [Math.min(...column), Math.max(...column)];
    if (high - low > SAME_CONCENTRATION * Math.abs(high)) varied.push(j);
    else held.push({ species, concentration: column[0]! });
  });
  const design = table.concentrations.map((row) => [1, ...varied.map((j) => Math.log(row[j]!))]);
  const y = table.rates.map((r) => Math.log(r));
  const uncertainties = table.rateUncertainties;
  const problem = {
    design,
    y,
    names: ['ln k_app', ...varied.map((j) => table.species[j]!)],
    weighting,
    ...(uncertainties ? { weights: table.rates.map((r, i) => (r / uncertainties[i]!) ** 2) } : {}),
  };
  const fit = linearLeastSquares(problem);
  const issues: FitIssue[] = [];
  if (varied.length === 0)
    issues.push({ kind: 'not-identifiable', message: 'no concentration varies, so no order can be found' });
  for (const q of fit.parameters.slice(1))
    if (!q.identifiable)
      issues.push({ kind: 'not-identifiable', parameter: q.name, message: `${q.name}: ${q.identifiabilityNote}` });
  if (fit.dof < 1)
    issues.push({ kind: 'too-few-points', message: `${fit.n} points leave no degree of freedom for an uncertainty` });
  return { orders: fit.parameters.slice(1), lnApparentConstant: fit.parameters[0]!, held, fit, issues };
}
