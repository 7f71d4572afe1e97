/**
 * At most one step may be marked rds: true, the step must run on the route (σ > 0), and
 * approximation: rds needs one. Otherwise no rate-determining-step law is derived.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const stepRds = {
  id: 'step/rds',
  summary: 'the rate-determining step is missing, doubled or off the route',
} as const satisfies RuleDefinition;
