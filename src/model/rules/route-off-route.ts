/**
 * A note (info) for every step the route finder leaves off the route (σ = 0), with the reason:
 * it starts or ends chains (initiation and termination stay off the route, the long-chain
 * convention), it is a dead-end or side reaction that no route step needs, or the best route
 * through it is not preferred (and why). A step is never left off silently.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const routeOffRoute = {
  id: 'route/off-route',
  summary: 'a step is off the route (σ = 0), with the reason',
} as const satisfies RuleDefinition;
