/**
 * The exact steady state needs more symbolic work than one derivation may spend (a long reversible
 * chain or a densely connected network, whose King–Altman sums grow combinatorially). The budget
 * is counted in term products, not seconds, so the same record stops at the same point on every
 * machine; the law then falls back to a numeric steady state at each observation with constants.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const rateSymbolicBudget = {
  id: 'rate/symbolic-budget',
  summary: 'the exact steady state needs more symbolic work than the budget allows',
} as const satisfies RuleDefinition;
