/**
 * A data table needs more measurements than the fit has parameters: a single point gives no
 * order and no activation energy (an error); exactly as many points as parameters fit exactly and
 * leave no degree of freedom for an uncertainty (a warning).
 */
import type { RuleDefinition } from './rule-definition.ts';

export const dataPoints = {
  id: 'data/points',
  summary: 'a data table has too few points for a fit with an uncertainty',
} as const satisfies RuleDefinition;
