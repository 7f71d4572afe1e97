/**
 * An elementary step on a surface must conserve surface sites: a vacant site `@` and each species
 * held on one (`CO@`) count one site of their kind, so adsorption `CO + @ -> CO@` balances and
 * `CO + @ -> CO@ + @` creates a site from nothing. Sites are a pseudo-element: they are checked
 * apart from the atoms, so the message names the sites and never reports a missing element.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const balanceSites = {
  id: 'balance/sites',
  summary: 'a step does not conserve surface sites',
} as const satisfies RuleDefinition;
