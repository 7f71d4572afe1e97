/**
 * The range a data value may take, by its column's role and the table's kind. Temperatures are
 * checked by the engine once their unit is known (a temperature in °C may be below zero).
 */
import type { DataKind } from '../model/index.ts';
import type { ColumnRole } from './data-kind-columns.ts';

/** Why a value cannot be, or undefined when it can. */
export function rangeProblem(kind: DataKind, role: ColumnRole, name: string, value: number): string | undefined {
  if (role === 'rate' && !(value > 0))
    return `an initial rate must be positive (orders are fitted to its logarithm); ${value} is not`;
  if (role === 'species' && kind === 'initial_rates' && !(value > 0))
    return `a concentration in an initial-rate table must be positive (orders are fitted to its logarithm); ${value} is not`;
  if (role === 'constant' && !(value > 0)) return `a rate constant must be positive; ${value} is not`;
  if (role === 'time' && value < 0) return `a time must not be negative; ${value} is`;
  if (role === 'uncertainty' && !(value > 0))
    return `the uncertainty ${name} must be positive (it sets the weight 1/u² of its point); ${value} is not`;
  return undefined;
}
