/**
 * The Horiuti stoichiometric numbers σ are derived by the preference order of DESIGN.md item 2.
 * When several routes are equally preferred and not proportional, or when no route changes
 * anything, the record must give times on each step. Steps that share no species with the route
 * are reported as a separate reaction; parallel paths to one overall reaction, and a route chosen
 * by declared roles rather than by the steps alone, are noted (info).
 */
import type { RuleDefinition } from './rule-definition.ts';

export const routeAmbiguous = {
  id: 'route/ambiguous',
  summary: 'no single route could be chosen',
} as const satisfies RuleDefinition;
