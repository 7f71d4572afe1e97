/**
 * Everything a simulation of one observation needs: numeric constants for every step, the
 * starting concentrations, which species are held constant, and which product measures the
 * overall rate. Returns a reason instead when something is missing.
 */
import type { Observation } from '../../model/index.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import type { DerivedRateLaw } from '../rate-law/derive-rate-laws.ts';
import type { Route } from '../route/route.ts';
import { CONCENTRATION, sameDimension } from '../units/dimension.ts';
import { parseQuantity, toCanonical } from '../units/quantity.ts';
import { equilibriumConstant, forwardConstant, reverseConstant } from '../rate-law/symbols.ts';
import { massActionModel, type MassActionModel } from './mass-action-system.ts';
import type { RateProbe } from './initial-rate.ts';

/** What a simulation needs from a derivation: the mechanism, its route and the rate laws it tests. */
export interface SimulationBasis {
  mechanism: Mechanism;
  /** the route, with the roles as the rate law confirmed them */
  route: Route;
  rateLaws: readonly DerivedRateLaw[];
}

export interface SimulationSetup {
  model: MassActionModel;
  y0: Float64Array;
  probe: RateProbe;
  /** species held at constant concentration */
  held: Set<string>;
}

/** Builds the simulation of one observation from the mechanism, its route and the numeric constants by symbol. */
export function simulationSetup(
  basis: SimulationBasis,
  constants: ReadonlyMap<string, number>,
  observation: Observation,
): SimulationSetup | { missing: string } {
  const { mechanism } = basis;
  const forward: number[] = [];
  const reverse: number[] = [];
  for (const step of mechanism.steps) {
    const k = constants.get(forwardConstant(step.label));
    if (k === undefined) return { missing: `the rate constant of step ${step.label}` };
    forward.push(k);
    if (!step.reversible) {
      reverse.push(0);
      continue;
    }
    const K = constants.get(equilibriumConstant(step.label));
    const kr = constants.get(reverseConstant(step.label)) ?? (K !== undefined ? k / K : undefined);
    if (kr === undefined) return { missing: `the reverse rate constant or K of step ${step.label}` };
    reverse.push(kr);
  }
  const held = new Set([...mechanism.species.values()].filter((s) => s.buffered || s.solvent).map((s) => s.symbol));
  const model = massActionModel(mechanism, { forward, reverse }, held);
  const y0 = new Float64Array(model.species.length);
  for (const [species, text] of Object.entries(observation.concentrations ?? {})) {
    const i = model.species.indexOf(species);
    const q = parseQuantity(text);
    if (i < 0 || 'error' in q || !sameDimension(q.quantity.unit.dimension, CONCENTRATION) || q.quantity.value < 0)
      continue;
    y0[i] = toCanonical(q.quantity);
  }
  for (const sp of held)
    if (y0[model.species.indexOf(sp)] === 0) return { missing: `the concentration of ${sp}, which is held constant` };
  const probe = rateProbe(basis, model.species, y0, held);
  return 'missing' in probe ? probe : { model, y0, probe, held };
}

/** The product that measures the overall rate, and the largest extent the starting mixture `y0` allows. */
export function rateProbe(
  basis: SimulationBasis,
  species: string[],
  y0: Float64Array,
  held: ReadonlySet<string>,
): RateProbe | { missing: string } {
  const overall = basis.route.overall;
  const steps = basis.mechanism.steps;
  const products = [...overall.products].filter(([sp]) => !held.has(sp));
  products.sort(
    ([a], [b]) => steps.filter((s) => s.change.has(a)).length - steps.filter((s) => s.change.has(b)).length,
  );
  const chosen = products[0];
  if (!chosen) return { missing: 'a product to follow' };
  const reactants = [...overall.reactants].filter(([sp]) => !held.has(sp));
  const extents = reactants.map(([sp, nu]) => y0[species.indexOf(sp)]! / nu.toNumber());
  const maxExtent = Math.min(...extents);
  if (!(maxExtent > 0) || !Number.isFinite(maxExtent))
    return { missing: 'a starting concentration for every reactant' };
  return { product: species.indexOf(chosen[0]), coefficient: chosen[1].toNumber(), maxExtent };
}
