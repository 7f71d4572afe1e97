/**
 * The activation parameters fitted from a temperature series (Eyring ΔG‡, or ΔH‡ on an enthalpy
 * basis) lie outside their 95 % interval of the barrier the record gives for the same constant: a
 * step's barrier for k_label, the energetic span for k_obs. Either the energies or the assignment
 * of the measured constant to that step is wrong.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const fitActivation = {
  id: 'fit/activation',
  summary: 'fitted activation parameters disagree with the recorded step energies',
} as const satisfies RuleDefinition;
