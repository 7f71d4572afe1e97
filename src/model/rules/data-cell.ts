/**
 * Every cell of a data table holding a quantity must be a number (1.2, 1.2e-3, -0.5); an empty
 * cell is allowed only for a concentration not measured at some time of a time course.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const dataCell = {
  id: 'data/cell',
  summary: 'a data cell is not a number',
} as const satisfies RuleDefinition;
