/**
 * The route search tries every connected set of steps without `times`, and within each the sets
 * of species that may cancel. It spends a measured work budget (and handles at most 16 steps
 * without times): a mechanism too large or too tangled for it stops in seconds with this error
 * instead of running for minutes, and the record must give times on each step.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const routeSearchLimit = {
  id: 'route/search-limit',
  summary: 'the route search stopped at its work limit; give times on each step',
} as const satisfies RuleDefinition;
