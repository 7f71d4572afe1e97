/**
 * A rate law's apparent constant fitted to a data set is not determined by those data: its
 * standard error exceeds its value, or the covariance is near-singular (the data cannot separate
 * it from another constant). The law's other constants and its criteria still stand; measuring
 * where the constant's term matters (for a K, concentrations near 1/K) would determine it.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const fitNotIdentifiable = {
  id: 'fit/not-identifiable',
  summary: 'a fitted constant is not determined by the data',
} as const satisfies RuleDefinition;
