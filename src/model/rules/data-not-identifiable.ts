/**
 * The data must vary what is to be found: an order needs its species' concentration varied, and
 * independently of the other varied species (two concentrations doubled together cannot tell
 * their orders apart); an activation energy needs more than one temperature; a time course more
 * than one time.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const dataNotIdentifiable = {
  id: 'data/not-identifiable',
  summary: 'the data do not vary what the fit must find',
} as const satisfies RuleDefinition;
