/**
 * The steady-state equations are nonlinear in the intermediates (a product of two intermediates,
 * or a square) and exact elimination gives no closed form: the polynomial left for the last
 * intermediate is of degree above two, its positive root is not unique, or the others then follow
 * from nonlinear equations. Reported at the first step that brings two internal species together,
 * naming the species, the steps and the constants a numeric solution needs; the steady state is
 * then solved numerically at each observation that gives constants. (Binomials and quadratics
 * have closed forms and raise no diagnostic.)
 */
import type { RuleDefinition } from './rule-definition.ts';

export const rateNonlinear = {
  id: 'rate/nonlinear',
  summary: 'the steady state has no closed-form solution here',
} as const satisfies RuleDefinition;
