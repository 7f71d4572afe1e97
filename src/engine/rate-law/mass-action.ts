/**
 * Mass-action rates of elementary steps as polynomials: forward k_i Π[reactant]^ν and, for a
 * reversible step, reverse k_-i Π[product]^ν. A species on both sides (a third body) counts in
 * both rates and cancels in the net change.
 */
import { Monomial, Polynomial } from '../exact/index.ts';
import type { Term } from '../notation/equation.ts';
import type { Step } from '../mechanism/mechanism.ts';
import { Rational } from '../exact/rational.ts';
import { concentration, forwardConstant, reverseConstant } from './symbols.ts';

/** k Π[X]^ν over one side of a step. */
export function sideRate(constant: string, terms: readonly Term[]): Polynomial {
  const factors: [string, number][] = [
    [constant, 1],
    ...terms.map((t): [string, number] => [concentration(t.species), t.coefficient.toNumber()]),
  ];
  return Polynomial.term(Rational.ONE, Monomial.fromFactors(factors));
}

/** The forward rate of a step. */
export function forwardRate(step: Step): Polynomial {
  return sideRate(forwardConstant(step.label), step.reactants);
}

/** The reverse rate of a reversible step, zero for a one-way step. */
export function reverseRate(step: Step): Polynomial {
  return step.reversible ? sideRate(reverseConstant(step.label), step.products) : Polynomial.ZERO;
}

/** Net rate of a step: forward minus reverse. */
export function netRate(step: Step): Polynomial {
  return forwardRate(step).sub(reverseRate(step));
}
