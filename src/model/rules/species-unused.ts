/**
 * A species under species: that no step equation mentions is probably a typo of a symbol that is
 * used, or left over from an earlier version of the mechanism.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const speciesUnused = {
  id: 'species/unused',
  summary: 'a declared species occurs in no step',
} as const satisfies RuleDefinition;
