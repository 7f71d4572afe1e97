/**
 * An elementary step must conserve every element. The message lists the element counts on each
 * side. Where a species has no composition (labels notation or formula: null) the balance is
 * skipped for its steps, with an info note.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const balanceAtoms = {
  id: 'balance/atoms',
  summary: 'a step does not conserve atoms',
} as const satisfies RuleDefinition;
