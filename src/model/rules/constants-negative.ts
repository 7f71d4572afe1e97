/**
 * A rate constant (k, k_rev) or an equilibrium constant (K) must be positive: a negative or zero
 * value has no physical meaning, and the rate laws, simulations and energy profiles built on it
 * would look plausible and be wrong. The value is not used.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const constantsNegative = {
  id: 'constants/negative',
  summary: 'a rate or equilibrium constant is zero or negative',
} as const satisfies RuleDefinition;
