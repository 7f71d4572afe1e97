/**
 * Starting concentrations are amounts: a negative one (a sign slip, a copied difference) would
 * feed apparent orders and simulations and give numbers that look like results. Reported here,
 * once per value and whatever else the record gets to, and never used by the later stages.
 */
import { diagnostic, type Diagnostic, type Observation } from '../../model/index.ts';
import { parseQuantity } from '../units/quantity.ts';

/** A `observation/negative-concentration` error for every concentration written below zero. */
export function checkNegativeConcentrations(observations: readonly Observation[]): Diagnostic[] {
  const diagnostics: Diagnostic[] = [];
  observations.forEach((observation, index) => {
    for (const [species, text] of Object.entries(observation.concentrations ?? {})) {
      const parsed = parseQuantity(text);
      if ('error' in parsed || !(parsed.quantity.value < 0)) continue;
      const message = `the concentration of ${species} is negative (${String(text)}); a starting concentration is at least 0`;
      const path = ['observations', index, 'concentrations', species];
      diagnostics.push(diagnostic('observation/negative-concentration', 'error', message, { path, actual: text }));
    }
  });
  return diagnostics;
}
