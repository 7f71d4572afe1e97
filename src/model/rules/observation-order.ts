/**
 * The observed order, within its uncertainty (± 0.1 when none is given, common practice), lies
 * outside the order the rate law predicts at the observation's conditions, or outside the range of
 * its limits for any constants. For a favoured record this is an error, otherwise a warning.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const observationOrder = {
  id: 'observation/order',
  summary: 'an observed order contradicts the rate law',
} as const satisfies RuleDefinition;
