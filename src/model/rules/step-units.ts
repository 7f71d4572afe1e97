/**
 * A rate constant of a step of molecularity n has units of concentration^(1-n) per time (M^-1 s^-1
 * for a bimolecular step). A unit of the wrong dimension, a missing unit or an unreadable quantity
 * is reported at the constant.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const stepUnits = {
  id: 'step/units',
  summary: "a rate constant's unit does not fit its step",
} as const satisfies RuleDefinition;
