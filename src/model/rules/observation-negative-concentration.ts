/**
 * A starting concentration in an observation must not be negative: it would be used in apparent
 * orders and simulations and give numbers that look like results. The value is not used.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const observationNegativeConcentration = {
  id: 'observation/negative-concentration',
  summary: 'an observed concentration is negative',
} as const satisfies RuleDefinition;
