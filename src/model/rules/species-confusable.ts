/**
 * A symbol in labels notation holds a character a reader cannot tell apart from a common one: a
 * Cyrillic or Greek letter that looks Latin (А, Е, Р, ο), a zero-width character, or a
 * bidirectional control that reorders what is shown. `А` and `A` would be two different species
 * that look the same on every page. In formula notation such symbols are already formula errors.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const speciesConfusable = {
  id: 'species/confusable',
  summary: 'a species symbol holds a look-alike, zero-width or bidirectional-control character',
} as const satisfies RuleDefinition;
