/**
 * The rate of the overall reaction from the formation of one species: r = (d[P]/dt) / ν_P, where
 * ν_P is its coefficient in the overall equation. A product made in one step only is preferred,
 * so the expression stays short; failing a product, a reactant's consumption is used.
 */
import { Polynomial } from '../exact/index.ts';
import { netOverRoute } from '../route/overall-equation.ts';
import { Rational } from '../exact/rational.ts';
import type { RateLawContext } from './context.ts';
import { netRate } from './mass-action.ts';

/** The overall rate as a polynomial in constants and concentrations, and the species it is read from. */
export function overallRatePolynomial(
  context: RateLawContext,
): { species: string; polynomial: Polynomial } | undefined {
  const { mechanism, sigma, internal, solvents } = context;
  const net = netOverRoute(mechanism, sigma);
  const candidates = [...net].filter(([sp, v]) => !v.isZero() && !internal.includes(sp) && !solvents.includes(sp));
  const stepsChanging = (sp: string) => mechanism.steps.filter((s) => s.change.has(sp)).length;
  const ranked = candidates.sort(([a, va], [b, vb]) => vb.sign() - va.sign() || stepsChanging(a) - stepsChanging(b));
  const chosen = ranked[0];
  if (!chosen) return undefined;
  const [species, nu] = chosen;
  const formation = Polynomial.sum(
    mechanism.steps.map((s) => netRate(s).scale(s.change.get(species) ?? Rational.ZERO)),
  );
  return { species, polynomial: formation.scale(nu.inverse()) };
}
