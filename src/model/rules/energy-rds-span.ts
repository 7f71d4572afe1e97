/**
 * The energetic span model (Kozuch and Shaik) names the TOF-determining transition state, measured
 * from the lowest preceding minimum. When it is not the step declared rate-determining, the
 * declaration is likely wrong.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const energyRdsSpan = {
  id: 'energy/rds-span',
  summary: 'the declared rate-determining step disagrees with the energetic span',
} as const satisfies RuleDefinition;
