/**
 * A transition state below one of its neighbouring minima means a sign slip or a change measured
 * the wrong way; a cycle with a positive reaction energy runs backwards; a route step without
 * energies leaves the profile schematic.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const energyProfile = {
  id: 'energy/profile',
  summary: 'the energy profile is inconsistent or incomplete',
} as const satisfies RuleDefinition;
