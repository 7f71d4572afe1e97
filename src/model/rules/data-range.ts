/**
 * A value must lie in the range its quantity allows: initial rates, concentrations in an
 * initial-rate table, rate constants and absolute temperatures are positive (orders and
 * activation parameters are fitted to their logarithms), times and uncertainties are not
 * negative, and an uncertainty used as a weight is not zero.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const dataRange = {
  id: 'data/range',
  summary: 'a data value lies outside the range its quantity allows',
} as const satisfies RuleDefinition;
