/**
 * The stiff integration of an observation did not reach its initial-rate point (too few steps, a
 * non-finite state, or no conversion). The approximations could not be checked against it.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const simulationFailed = {
  id: 'simulation/failed',
  summary: 'a simulation gave no initial rate',
} as const satisfies RuleDefinition;
