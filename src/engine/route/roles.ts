/**
 * Roles of species (DESIGN.md item 3), derived from the route: net consumed → reactant,
 * net formed → product, net zero → catalyst when it must be present for the route to start
 * (walk-route.ts), otherwise intermediate; a species found only on steps off the route (σ = 0) is
 * off_route — a side product, a side reactant or a dead-end form, never a catalyst.
 * A solvent keeps its stoichiometry but is named as such; a species on both sides of every
 * step it takes part in is a third body. Declared roles are checked against the derived ones.
 */
import type { Role } from '../../model/index.ts';
import type { Diagnostic } from '../../model/index.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import { declaredMismatches } from './declared-roles.ts';
import { netOverRoute } from './overall-equation.ts';
import type { Unhonoured } from './stoichiometric-numbers.ts';
import { walkRoute } from './walk-route.ts';

/** What the roles stage gives the route. */
export interface DerivedRoles {
  roles: Map<string, Role>;
  /** net-zero species that occur only in steps with σ = 0 (a dead-end complex, a free binder) */
  offRoute: Set<string>;
  /**
   * How each off_route species enters the kinetics: a dead-end form (intermediate), a binder
   * nothing makes (catalyst), a side product (product) or a side reactant (reactant).
   */
  offRouteKinds: Map<string, Role>;
  routeOrder: number[];
  diagnostics: Diagnostic[];
}

/** Derives the role of every species along σ; `unhonoured` says why a declaration could not be kept. */
export function deriveRoles(
  mechanism: Mechanism,
  sigma: readonly number[],
  unhonoured: ReadonlyMap<string, Unhonoured> = new Map(),
): DerivedRoles {
  const net = netOverRoute(mechanism, sigma);
  const roles = new Map<string, Role>();
  const offRoute = new Set<string>();
  const offRouteKinds = new Map<string, Role>();
  const { seeds, order } = walkRoute(mechanism, sigma, net);
  for (const [symbol, species] of mechanism.species) {
    const n = net.get(symbol)!;
    const firstOnRoute = firstChange(mechanism, symbol, (i) => (sigma[i] ?? 0) > 0);
    const firstAnywhere = firstChange(mechanism, symbol, () => true);
    let role: Role;
    if (species.solvent) role = 'solvent';
    else if (species.thirdBody || (firstAnywhere === 0 && appearsInSteps(mechanism, symbol))) role = 'third_body';
    else if (n.sign() < 0) role = 'reactant';
    else if (n.sign() > 0) role = 'product';
    else if (firstOnRoute === 0) {
      role = 'off_route';
      const kind = offRouteKind(mechanism, symbol, firstAnywhere);
      offRouteKinds.set(symbol, kind);
      if (kind !== 'product' && kind !== 'reactant') offRoute.add(symbol);
    } else {
      role = seeds.has(symbol) ? 'catalyst' : 'intermediate';
      // The record decides between the two net-zero kinds on the route where it says.
      if (species.declaredRole === 'intermediate' || species.declaredRole === 'catalyst') role = species.declaredRole;
    }
    roles.set(symbol, role);
  }
  return {
    roles,
    offRoute,
    offRouteKinds,
    routeOrder: order,
    diagnostics: declaredMismatches(mechanism, roles, net, unhonoured),
  };
}

/**
 * Off the route: a species only ever made by one-way steps is a side product (a termination
 * product); only ever used up, a side reactant; what binding off the route makes first is a
 * dead-end form (an intermediate of the side equilibrium); a binder that nothing makes (a free
 * inhibitor) behaves as a catalyst does, taken up before it is given back.
 */
function offRouteKind(mechanism: Mechanism, symbol: string, firstAnywhere: number): Role {
  const oneWay = oneWaySign(mechanism, symbol);
  if (oneWay !== 0) return oneWay > 0 ? 'product' : 'reactant';
  return firstAnywhere > 0 ? 'intermediate' : 'catalyst';
}

/** Sign of the first non-zero change of a species over the steps that pass the filter, in record order. */
function firstChange(mechanism: Mechanism, symbol: string, include: (index: number) => boolean): number {
  for (const step of mechanism.steps) {
    if (!include(step.index)) continue;
    const v = step.change.get(symbol);
    if (v) return v.sign();
  }
  return 0;
}

/** +1 when a species is only ever formed, −1 only ever consumed, in one-way steps; 0 otherwise. */
function oneWaySign(mechanism: Mechanism, symbol: string): number {
  const steps = mechanism.steps.filter((s) => s.change.has(symbol));
  if (steps.length === 0 || steps.some((s) => s.reversible)) return 0;
  const signs = new Set(steps.map((s) => s.change.get(symbol)!.sign()));
  return signs.size === 1 ? [...signs][0]! : 0;
}

function appearsInSteps(mechanism: Mechanism, symbol: string): boolean {
  return mechanism.steps.some((s) => [...s.reactants, ...s.products].some((t) => t.species === symbol));
}
