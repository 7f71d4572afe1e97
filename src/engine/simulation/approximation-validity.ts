/**
 * How good each derived rate law is at an observation's conditions (DESIGN.md item 7): the
 * simulated initial rate (extrapolated to zero conversion), initial-rate orders by simulation
 * (each starting concentration scaled by 1.05^±1, log–log slope), and the relative error
 * |r_law − r_sim| / r_sim of every rate law, both evaluated at the simulated state at 1 % conversion. Errors above the threshold become
 * `approximation/invalid` warnings that say which assumption fails.
 */
import type { Observation } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { lawExpression, type DerivedRateLaw } from '../rate-law/derive-rate-laws.ts';
import { rateValue } from '../rate-law/orders.ts';
import type { RateLawMethod } from '../rate-law/rate-law.ts';
import { solveSteadyStateNumeric } from '../rate-law/steady-state-numeric.ts';
import { concentration } from '../rate-law/symbols.ts';
import { explainFailure } from './explain-failure.ts';
import { rememberedInitialRate } from './remembered-runs.ts';
import { simulatedOrders } from './simulated-orders.ts';
import { simulationSetup, type SimulationBasis, type SimulationSetup } from './simulation-setup.ts';

/** Relative error above which an approximation is reported invalid (10 %, configurable). */
export const DEFAULT_APPROXIMATION_THRESHOLD = 0.1;

export interface SimulationCheck {
  observation: string;
  status: 'ok' | 'failed' | 'skipped';
  message?: string;
  /** the simulated rate extrapolated to zero conversion, in M s^-1 */
  initialRate?: number;
  /** time of the reading at 1 % conversion, where the rate laws are checked against the simulation, in s */
  time?: number;
  orders: Record<string, number>;
  approximationError: Partial<Record<RateLawMethod, number>>;
}

/** Simulates every observation that has constants and concentrations. */
export function checkApproximations(
  observations: readonly Observation[],
  basis: SimulationBasis,
  constants: ReadonlyMap<string, number>,
  threshold = DEFAULT_APPROXIMATION_THRESHOLD,
): { checks: SimulationCheck[]; diagnostics: Diagnostic[] } {
  const checks: SimulationCheck[] = [];
  const diagnostics: Diagnostic[] = [];
  observations.forEach((observation, index) => {
    const base = { observation: observation.id, orders: {}, approximationError: {} };
    const setup = simulationSetup(basis, constants, observation);
    if ('missing' in setup) {
      checks.push({ ...base, status: 'skipped', message: `not simulated: needs ${setup.missing}` });
      return;
    }
    const result = rememberedInitialRate(basis.mechanism, setup.model, setup.y0, setup.probe);
    if (result.status !== 'ok' || !(result.readingRate > 0)) {
      const message = result.status === 'ok' ? 'the simulated rate is not positive' : result.message;
      checks.push({ ...base, status: 'failed', message });
      diagnostics.push(
        diagnostic(
          'simulation/failed',
          'warning',
          `the simulation of observation ${observation.id} gave no initial rate: ${message}`,
          {
            path: ['observations', index],
            note: 'the approximations could not be checked against it; look at the constants and concentrations',
          },
        ),
      );
      return;
    }
    const check: SimulationCheck = {
      ...base,
      status: 'ok',
      initialRate: result.rate,
      time: result.time,
      orders: simulatedOrders(basis, setup, Object.keys(observation.orders ?? {})),
    };
    for (const derived of basis.rateLaws) {
      const approx = lawRateAt(derived, setup, result.state, constants);
      if (approx === undefined) continue;
      // Law and simulation at one and the same state: the reading's, not the extrapolated rate.
      const error = Math.abs(approx - result.readingRate) / result.readingRate;
      check.approximationError[derived.law.method] = Math.round(error * 1e4) / 1e4;
      if (error > threshold) {
        diagnostics.push(
          diagnostic(
            'approximation/invalid',
            'warning',
            `${describe(derived)} is off by ${(error * 100).toFixed(0)} % at observation ${observation.id}: ${explainFailure(derived, basis, setup, result.state)}`,
            {
              path: ['observations', index],
              actual: error,
              expected: `≤ ${threshold}`,
            },
          ),
        );
      }
    }
    checks.push(check);
  });
  return { checks, diagnostics };
}

function describe(derived: DerivedRateLaw): string {
  const method = derived.law.method;
  return method === 'rds'
    ? 'the rate-determining-step rate law'
    : method === 'long_chain'
      ? 'the long-chain rate law'
      : 'the steady-state rate law';
}

/** The rate law's value at the simulated state (external concentrations, pool totals from the start). */
export function lawRateAt(
  derived: DerivedRateLaw,
  setup: SimulationSetup,
  state: Float64Array,
  constants: ReadonlyMap<string, number>,
): number | undefined {
  const values = new Map(constants);
  const at = (sp: string, y: Float64Array) => y[setup.model.species.indexOf(sp)] ?? 0;
  setup.model.species.forEach((sp, i) => values.set(concentration(sp), state[i]!));
  // A pool's total is conserved: what the starting mixture put into it.
  for (const pool of derived.law.pools ?? [])
    values.set(
      pool.total,
      pool.species.reduce((sum, sp, i) => sum + pool.weights[i]! * at(sp, setup.y0), 0),
    );
  const exact = lawExpression(derived);
  if (exact) return rateValue(exact, values);
  if (derived.law.nonlinear) {
    for (const u of derived.law.nonlinear.unknowns) values.delete(u);
    return solveSteadyStateNumeric(derived.law.nonlinear, values)?.rate;
  }
  return undefined;
}
