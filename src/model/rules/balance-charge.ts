/**
 * An elementary step must conserve charge; the message gives the charge of each side. Electrons
 * are written e-.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const balanceCharge = {
  id: 'balance/charge',
  summary: 'a step does not conserve charge',
} as const satisfies RuleDefinition;
