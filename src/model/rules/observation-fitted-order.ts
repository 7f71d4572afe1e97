/**
 * An observation gives both a hand-entered order and a data table, and the order fitted from the
 * table (with its 95 % interval) does not overlap the hand-entered one (with its tolerance). The
 * fitted order is the one judged against the rate laws; the hand entry is probably a slip in the
 * reduction done by hand, or belongs to other runs.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const observationFittedOrder = {
  id: 'observation/fitted-order',
  summary: 'a hand-entered order disagrees with the order fitted from the data',
} as const satisfies RuleDefinition;
