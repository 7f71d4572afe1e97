/**
 * In formula notation every symbol must read as a formula in trade notation (elements, brackets,
 * hydrate dots, charges, radical dots, phases). Records of invented species use notation: labels,
 * or give a formula per species.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const formulaSyntax = {
  id: 'formula/syntax',
  summary: 'a species symbol is not a chemical formula',
} as const satisfies RuleDefinition;
