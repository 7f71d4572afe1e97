/**
 * The record asks for the long-chain approximation (`approximation: long_chain`) but its route is
 * not a chain: no intermediate carries the route, a step on the route makes or destroys carriers,
 * or there is no initiation or no termination step. The approximation (initiation = termination,
 * propagation alone for the carriers' ratio) has nothing to apply to, so no long-chain law is given.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const rateNotAChain = {
  id: 'rate/not-a-chain',
  summary: 'the long-chain approximation is asked for, but the route is not a chain',
} as const satisfies RuleDefinition;
