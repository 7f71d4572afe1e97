/**
 * An order must be a plain number with an optional uncertainty; a concentration must have a
 * concentration unit; a temperature a temperature unit.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const observationUnits = {
  id: 'observation/units',
  summary: "an observation's quantity cannot be read",
} as const satisfies RuleDefinition;
