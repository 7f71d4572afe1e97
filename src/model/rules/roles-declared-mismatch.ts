/**
 * A species declared with role: must take that role in the derivation (a declared intermediate
 * must cancel on the route; a declared inhibitor must have a negative order). The message names
 * the role the derivation gives and why ("no route through these steps lets it cancel: it is
 * formed net on the route"). The route finder never leaves out a step to make a declaration
 * true: where only such a route would honour it, the route through every step stands and the
 * declaration is reported here, at its line. A declared chain carrier that no propagation cycle
 * regenerates is reported here too.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const rolesDeclaredMismatch = {
  id: 'roles/declared-mismatch',
  summary: 'a declared role disagrees with the derived one',
} as const satisfies RuleDefinition;
