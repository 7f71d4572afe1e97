/**
 * Molecularity of elementary steps: the number of particles that meet in the step
 * (IUPAC Gold Book, "molecularity"). 1–2 is ordinary, 3 is rare (common practice), more is not elementary.
 * A vacant surface site (`@`) is where a molecule lands, not a particle that collides, so the check
 * leaves it out: dissociative adsorption O2 + 2 @ -> 2 O@ is an ordinary step (its rate constant
 * still carries [@]², so units count the sites).
 */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Mechanism, Step } from './mechanism.ts';
import type { Term } from '../notation/equation.ts';
import { isVacantSite } from '../notation/formula-sites.ts';

/** Sum of the coefficients of one side of a step. */
export function molecularity(terms: readonly Term[]): number {
  return terms.reduce((n, t) => n + t.coefficient.toNumber(), 0);
}

/** Checks the forward direction of every step, and the reverse of reversible ones. */
export function checkMolecularity(mechanism: Mechanism): Diagnostic[] {
  return mechanism.steps.flatMap((step) => {
    const particles = (terms: readonly Term[]) =>
      molecularity(terms.filter((t) => !isVacantSite(mechanism.species.get(t.species)?.composition)));
    const directions: [string, number][] = [['', particles(step.reactants)]];
    if (step.reversible) directions.push(['the reverse of ', particles(step.products)]);
    const withThirdBody = [...step.reactants, ...step.products].some(
      (t) => mechanism.species.get(t.species)?.thirdBody,
    );
    return directions.flatMap(([which, n]) => judge(step, which, n, withThirdBody));
  });
}

function judge(step: Step, which: string, n: number, withThirdBody: boolean): Diagnostic[] {
  const path = ['steps', step.index, 'equation'];
  if (n > 3) {
    return [
      diagnostic(
        'step/molecularity',
        'error',
        `${which}step ${step.label} brings ${n} particles together; an elementary step has molecularity of at most 3`,
        {
          path,
          actual: n,
          note: 'split it into elementary steps',
        },
      ),
    ];
  }
  if (n === 3 && withThirdBody) {
    return [
      diagnostic(
        'step/molecularity',
        'info',
        `${which}step ${step.label} is termolecular through a third body, as in gas-phase recombination at low pressure (common practice)`,
        {
          path,
          actual: n,
        },
      ),
    ];
  }
  if (n === 3) {
    return [
      diagnostic(
        'step/molecularity',
        'info',
        `${which}step ${step.label} is termolecular; such elementary steps are rare (common practice)`,
        {
          path,
          actual: n,
          note: 'a fast pre-equilibrium followed by a bimolecular step often explains the same third order',
        },
      ),
    ];
  }
  return [];
}
