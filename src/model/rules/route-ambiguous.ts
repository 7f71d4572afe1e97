/**
 * The Horiuti stoichiometric numbers σ are derived by the preference order of DESIGN.md item 2.
 * When several routes are equally preferred and not proportional, when no route changes anything,
 * or when the search is too large, the record must give times on each step. Steps that share no
 * species with the route are reported as a separate reaction.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const routeAmbiguous = {
  id: 'route/ambiguous',
  summary: 'no single route could be chosen',
} as const satisfies RuleDefinition;
