/**
 * The rate of the overall reaction from the formation of one species: r = (d[P]/dt) / ν_P, where
 * ν_P is its coefficient in the overall equation. A product made in one step only is preferred,
 * so the expression stays short; failing a product, a reactant's consumption is used.
 */
import { Polynomial } from '../exact/index.ts';
import { netOverRoute } from '../route/overall-equation.ts';
import { Rational } from '../exact/rational.ts';
import type { Step } from '../mechanism/mechanism.ts';
import type { RateLawContext } from './context.ts';
import { forwardRate, netRate, reverseRate } from './mass-action.ts';

/** Which one-way parts of the steps count towards the rate (all of them by default). */
export type StepFilter = (step: Step, direction: 'forward' | 'reverse') => boolean;

/**
 * The overall rate as a polynomial in constants and concentrations, and the species it is read
 * from; `include` keeps only some one-way steps (the long-chain approximation keeps propagation).
 */
export function overallRatePolynomial(
  context: RateLawContext,
  include?: StepFilter,
): { species: string; polynomial: Polynomial } | undefined {
  const { mechanism, sigma, internal, solvents } = context;
  const net = netOverRoute(mechanism, sigma);
  const candidates = [...net].filter(([sp, v]) => !v.isZero() && !internal.includes(sp) && !solvents.includes(sp));
  const stepsChanging = (sp: string) => mechanism.steps.filter((s) => s.change.has(sp)).length;
  const ranked = candidates.sort(([a, va], [b, vb]) => vb.sign() - va.sign() || stepsChanging(a) - stepsChanging(b));
  const chosen = ranked[0];
  if (!chosen) return undefined;
  const [species, nu] = chosen;
  const rateOf = (s: Step) =>
    include
      ? (include(s, 'forward') ? forwardRate(s) : Polynomial.ZERO).sub(
          include(s, 'reverse') ? reverseRate(s) : Polynomial.ZERO,
        )
      : netRate(s);
  const formation = Polynomial.sum(mechanism.steps.map((s) => rateOf(s).scale(s.change.get(species) ?? Rational.ZERO)));
  return { species, polynomial: formation.scale(nu.inverse()) };
}
