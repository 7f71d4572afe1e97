/**
 * With rate constants, the full mass-action kinetics is simulated at each observation. Where a
 * derived rate law is off the simulated initial rate by more than the threshold (10 % unless
 * --approximation-threshold says otherwise), the message says which assumption breaks: a pre-
 * equilibrium that is not fast, species piling up after the slow step, or intermediates that are
 * not dilute.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const approximationInvalid = {
  id: 'approximation/invalid',
  summary: "an approximation fails at an observation's conditions",
} as const satisfies RuleDefinition;
