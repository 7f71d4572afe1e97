/**
 * Apparent orders where the steady state is nonlinear: solve the steady state numerically at the
 * conditions and at [X](1 ± h), and take the central log–log slope of the rate.
 */
import { solveSteadyStateNumeric } from './steady-state-numeric.ts';
import type { NonlinearSystem } from './rate-law.ts';

const RELATIVE_STEP = 1e-3;

/** The apparent order in `symbol` at the given values, or undefined when the solve fails. */
export function numericOrderAt(
  system: NonlinearSystem,
  symbol: string,
  values: ReadonlyMap<string, number>,
): number | undefined {
  const x = values.get(symbol);
  if (x === undefined || x <= 0) return undefined;
  const rateAt = (value: number) => solveSteadyStateNumeric(system, new Map([...values, [symbol, value]]))?.rate;
  const up = rateAt(x * (1 + RELATIVE_STEP));
  const down = rateAt(x * (1 - RELATIVE_STEP));
  if (!up || !down || up <= 0 || down <= 0) return undefined;
  return Math.log(up / down) / Math.log((1 + RELATIVE_STEP) / (1 - RELATIVE_STEP));
}
