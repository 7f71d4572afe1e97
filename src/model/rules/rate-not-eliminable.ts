/**
 * The rate law needs every intermediate expressed through stable species. With the rate-
 * determining-step method, an intermediate that is not tied to reactants by reversible steps
 * before the slow step (treated as fast pre-equilibria) cannot be eliminated; the message says
 * what ties it, and where the steady-state method would work.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const rateNotEliminable = {
  id: 'rate/not-eliminable',
  summary: 'an intermediate cannot be eliminated',
} as const satisfies RuleDefinition;
