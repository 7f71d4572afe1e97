/**
 * Every column holding a quantity needs a unit of the right kind: a concentration for a species,
 * concentration per time for `rate`, a time for `t`, a temperature for `T` (K, or °C), a rate
 * constant's unit for `k`. Numbers without units cannot be compared with a rate law.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const dataUnits = {
  id: 'data/units',
  summary: "a data column's unit is missing or of the wrong kind",
} as const satisfies RuleDefinition;
