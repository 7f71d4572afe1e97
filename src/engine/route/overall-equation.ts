/**
 * The overall equation: Σ σ_i × step_i. Species that cancel drop out; a solvent keeps its
 * stoichiometry; catalysts are listed separately so they can be written over the arrow.
 */
import type { Mechanism } from '../mechanism/mechanism.ts';
import { Rational } from '../exact/rational.ts';

export interface OverallEquation {
  reactants: Map<string, Rational>;
  products: Map<string, Rational>;
  catalysts: string[];
  text: string;
}

/** Net change of every species over the route, in the mechanism's species order. */
export function netOverRoute(mechanism: Mechanism, sigma: readonly number[]): Map<string, Rational> {
  const net = new Map<string, Rational>();
  for (const symbol of mechanism.species.keys()) net.set(symbol, Rational.ZERO);
  mechanism.steps.forEach((step, i) => {
    const times = Rational.of(sigma[i] ?? 0);
    for (const [sp, v] of step.change) net.set(sp, net.get(sp)!.add(v.mul(times)));
  });
  return net;
}

/** Builds the overall equation from the stoichiometric numbers and the catalysts found by the roles. */
export function overallEquation(
  mechanism: Mechanism,
  sigma: readonly number[],
  catalysts: readonly string[],
): OverallEquation {
  const reactants = new Map<string, Rational>();
  const products = new Map<string, Rational>();
  for (const [sp, v] of netOverRoute(mechanism, sigma)) {
    if (v.sign() < 0) reactants.set(sp, v.neg());
    if (v.sign() > 0) products.set(sp, v);
  }
  const side = (m: Map<string, Rational>) =>
    [...m].map(([sp, c]) => (c.equals(Rational.ONE) ? sp : `${c} ${sp}`)).join(' + ') || '(nothing)';
  return { reactants, products, catalysts: [...catalysts], text: `${side(reactants)} -> ${side(products)}` };
}
