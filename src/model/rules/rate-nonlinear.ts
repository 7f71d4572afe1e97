/**
 * The steady-state equations are nonlinear in the intermediates (a product of two intermediates,
 * or a square), so no exact rational-function law is given; the steady state is solved numerically
 * at each observation that gives constants.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const rateNonlinear = {
  id: 'rate/nonlinear',
  summary: 'the steady state has no closed-form solution here',
} as const satisfies RuleDefinition;
