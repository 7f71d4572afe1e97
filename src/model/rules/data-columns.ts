/**
 * The columns of a data table must fit its kind: an initial-rate table needs `rate` and at least
 * one species, a time course `t` and at least one species, a temperature series `T` and `k`.
 * Names appear once; `u(NAME)` needs its column NAME; species columns name species of the
 * mechanism; every row has one cell per column; a table is inline (columns and rows) or in a file,
 * not both.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const dataColumns = {
  id: 'data/columns',
  summary: "a data table's columns do not fit its kind",
} as const satisfies RuleDefinition;
