/**
 * Says which assumption of a failing approximation breaks, from the simulated state:
 * for the rate-determining step, a pre-equilibrium that is not at equilibrium (Q/K ≠ 1) or
 * catalyst piling up after the slow step; for the steady state, internal species that are not
 * dilute next to the reactants, or that are still changing.
 */
import type { DerivedRateLaw } from '../rate-law/derive-rate-laws.ts';
import type { SimulationBasis, SimulationSetup } from './simulation-setup.ts';

/** One sentence naming the failing assumption. */
export function explainFailure(
  derived: DerivedRateLaw,
  basis: SimulationBasis,
  setup: SimulationSetup,
  state: Float64Array,
): string {
  if (derived.law.method === 'rds') return explainRds(basis, setup, state);
  const why = explainSteadyState(basis, setup, state);
  // With the carriers at steady state, what is left for the long-chain law is the length of the chains.
  return derived.law.method === 'long_chain' && why === STEADY_STATE_HOLDS_NOT
    ? 'the chains are too short at these constants for initiation and termination to be negligible next to propagation'
    : why;
}

const STEADY_STATE_HOLDS_NOT = 'the steady state does not hold at these constants';

function explainRds({ mechanism, route }: SimulationBasis, setup: SimulationSetup, state: Float64Array): string {
  const sigma = route.sigma;
  const rds = mechanism.steps.find((s) => s.rds)!;
  const rank = (index: number) => route.order[index] ?? index;
  const at = (sp: string) => state[setup.model.species.indexOf(sp)]!;
  const fluxes = setup.model.stepFluxes(state);
  for (const step of mechanism.steps) {
    const preEquilibrium =
      step !== rds && step.reversible && (rank(step.index) < rank(rds.index) || sigma[step.index] === 0);
    if (!preEquilibrium) continue;
    // The net flux through a step at equilibrium is a vanishing share of its one-way fluxes.
    const { forward, reverse } = fluxes[step.index]!;
    const share = forward + reverse > 0 ? Math.abs(forward - reverse) / (forward + reverse) : 0;
    if (share > 0.05) {
      return `the pre-equilibrium of step ${step.label} is not fast compared with step ${rds.label} at these constants (its net flux is ${(share * 100).toFixed(0)} % of its one-way fluxes)`;
    }
  }
  const after = mechanism.steps.filter((s) => rank(s.index) > rank(rds.index)).flatMap((s) => [...s.change.keys()]);
  const internal = [...route.roles].filter(
    ([sp, role]) => role === 'intermediate' && after.includes(sp) && !rds.reactants.some((t) => t.species === sp),
  );
  const piled = internal.filter(([sp]) => at(sp) > 0).sort(([a], [b]) => at(b) - at(a))[0];
  if (piled)
    return `species formed after the rate-determining step are not negligible (${piled[0]} builds up to ${at(piled[0]).toExponential(2)} M): step ${rds.label} is not the slowest`;
  return `step ${rds.label} does not control the rate at these constants`;
}

function explainSteadyState({ route }: SimulationBasis, setup: SimulationSetup, state: Float64Array): string {
  const roles = route.roles;
  const species = setup.model.species;
  const internal = species.filter(
    (sp) => roles.get(sp) === 'intermediate' || (roles.get(sp) === 'catalyst' && !setup.held.has(sp)),
  );
  const reactants = [...route.overall.reactants.keys()].filter((sp) => !setup.held.has(sp));
  const bound = internal
    .filter((sp) => roles.get(sp) === 'intermediate')
    .reduce((s, sp) => s + state[species.indexOf(sp)]!, 0);
  const smallest = Math.min(...reactants.map((sp) => setup.y0[species.indexOf(sp)]!));
  if (smallest > 0 && bound / smallest > 0.05) {
    return `the intermediates are not dilute: they hold ${((bound / smallest) * 100).toFixed(0)} % as much material as the scarcest reactant (the catalyst or intermediates must be far below the substrate)`;
  }
  const dydt = new Float64Array(species.length);
  setup.model.system.rhs(0, state, dydt);
  const drifting = internal.find((sp) => {
    const i = species.indexOf(sp);
    return state[i]! > 0 && Math.abs(dydt[i]!) * 1e3 > state[i]!;
  });
  if (drifting) return `the steady state of ${drifting} is not reached at 1 % conversion`;
  return STEADY_STATE_HOLDS_NOT;
}
