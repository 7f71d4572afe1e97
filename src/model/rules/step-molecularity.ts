/**
 * Molecularity is the number of reactant molecules of an elementary step (IUPAC Gold Book,
 * 'molecularity'). One or two is usual; three is allowed with a note, since termolecular steps are
 * rare (common practice); more than three is not an elementary step and is an error.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const stepMolecularity = {
  id: 'step/molecularity',
  summary: 'a step has more reactant molecules than an elementary step can',
} as const satisfies RuleDefinition;
