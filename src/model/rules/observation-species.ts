/**
 * An order or concentration is given for a symbol that no step mentions; it is probably a typo.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const observationSpecies = {
  id: 'observation/species',
  summary: 'an observation names a species the mechanism lacks',
} as const satisfies RuleDefinition;
