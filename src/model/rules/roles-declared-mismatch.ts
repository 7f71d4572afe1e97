/**
 * A species declared with role: must take that role in the derivation (a declared intermediate
 * must cancel on the route; a declared inhibitor must have a negative order). The message names
 * the role the derivation gives.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const rolesDeclaredMismatch = {
  id: 'roles/declared-mismatch',
  summary: 'a declared role disagrees with the derived one',
} as const satisfies RuleDefinition;
