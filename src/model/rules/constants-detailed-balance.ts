/**
 * Around a closed cycle of reversible steps the product of equilibrium constants must equal 1 (the
 * Wegscheider condition, a consequence of detailed balance). Given constants that break it
 * describe no possible equilibrium.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const constantsDetailedBalance = {
  id: 'constants/detailed-balance',
  summary: 'the constants around a cycle break detailed balance',
} as const satisfies RuleDefinition;
