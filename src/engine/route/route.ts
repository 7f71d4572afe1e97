/**
 * The route stage of a derivation: Horiuti stoichiometric numbers, the overall equation, the
 * roles, and the order in which the steps run, gathered into one `Route` value. Later stages
 * (rate laws, energies, simulations) take this narrow value, never the derivation being built.
 */
import { diagnostic, type Diagnostic, type Role } from '../../model/index.ts';
import type { Mechanism, Step } from '../mechanism/mechanism.ts';
import type { ChainStructure } from './chain-structure.ts';
import { offRouteReasons } from './off-route-reasons.ts';
import { overallEquation, type OverallEquation } from './overall-equation.ts';
import { deriveRoles } from './roles.ts';
import type { SearchBudget } from './search-budget.ts';
import { stoichiometricNumbers } from './stoichiometric-numbers.ts';

export type { ChainStructure };

/** One turnover of the overall reaction through the mechanism. */
export interface Route {
  /** Horiuti stoichiometric number σ of each step, in record order */
  sigma: readonly number[];
  /** σ given by the record (`times`) or derived */
  source: 'given' | 'derived';
  /** position of each step along the route, in record order (steps off the route: Infinity) */
  order: readonly number[];
  /** the steps of one turnover in the order they run, each repeated σ times */
  sequence: readonly Step[];
  overall: OverallEquation;
  /** role of every species, in the mechanism's species order */
  roles: ReadonlyMap<string, Role>;
  /** net-zero species that occur only in steps off the route (σ = 0) */
  offRoute: ReadonlySet<string>;
  /** how each species with role off_route enters the kinetics (dead-end form, binder, side product) */
  offRouteKinds?: ReadonlyMap<string, Role>;
  /** the chain the route carries (propagation cycle, initiation and termination off it), where one is declared or detected */
  chain?: ChainStructure;
}

/** Chooses the route of a mechanism and reads its overall equation and roles; `budget` bounds the search (search-budget.ts). */
export function deriveRoute(mechanism: Mechanism, budget?: SearchBudget): { route?: Route; diagnostics: Diagnostic[] } {
  const species = [...mechanism.species.values()];
  const declared = (role: Role) => species.filter((s) => s.declaredRole === role).map((s) => s.symbol);
  const carriers = new Set(species.filter((s) => s.entry?.chain_carrier === true).map((s) => s.symbol));
  const rds = mechanism.steps.find((s) => s.rds)?.index;
  const chosen = stoichiometricNumbers(mechanism.steps, {
    mustCancel: new Set([...declared('intermediate'), ...declared('catalyst')]),
    carriers,
    inert: new Set(species.filter((s) => s.solvent).map((s) => s.symbol)),
    ...(rds !== undefined && { rds }),
    ...(budget && { budget }),
  });
  const diagnostics = [...chosen.diagnostics];
  if (!chosen.numbers) return { diagnostics };
  const sigma = chosen.numbers;
  const derived = deriveRoles(mechanism, sigma, chosen.unhonoured);
  diagnostics.push(...derived.diagnostics, ...offRouteReasons(mechanism, sigma, chosen.ranked, chosen.chain));
  diagnostics.push(...uncarried(carriers, derived.roles));
  // Only catalysts on the route go over the arrow; a binder off the route (an inhibitor) does not.
  const catalysts = [...derived.roles].filter(([, r]) => r === 'catalyst').map(([sp]) => sp);
  const route: Route = {
    sigma,
    source: chosen.source === 'given' ? 'given' : 'derived',
    order: derived.routeOrder,
    sequence: routeSequence(mechanism, sigma, derived.routeOrder),
    overall: overallEquation(mechanism, sigma, catalysts),
    roles: derived.roles,
    offRoute: derived.offRoute,
    offRouteKinds: derived.offRouteKinds,
    ...(chosen.chain && { chain: chosen.chain }),
  };
  return { route, diagnostics };
}

/** Roles as the kinetics sees them: each off_route species as the kind it behaves like. */
export function kineticRoles(route: Pick<Route, 'roles' | 'offRouteKinds'>): Map<string, Role> {
  return new Map([...route.roles].map(([sp, r]) => [sp, r === 'off_route' ? (route.offRouteKinds?.get(sp) ?? r) : r]));
}

/** A declared chain carrier must cancel on the route, as a propagation cycle regenerates it. */
function uncarried(carriers: ReadonlySet<string>, roles: ReadonlyMap<string, Role>): Diagnostic[] {
  return [...carriers]
    .filter((sp) => roles.get(sp) !== 'intermediate' && roles.get(sp) !== 'catalyst')
    .map((sp) =>
      diagnostic(
        'roles/declared-mismatch',
        'error',
        `${sp} is declared a chain carrier, but no propagation cycle on the route regenerates it: it is ${roles.get(sp) === 'off_route' ? 'off the route' : `${roles.get(sp)?.replace('_', ' ') ?? 'not on the route'}`}`,
        { path: ['species', sp, 'chain_carrier'], actual: roles.get(sp), expected: 'chain carrier' },
      ),
    );
}

/**
 * The steps of one turnover in the order they run: by their position along the route (where a
 * cycle takes up its catalyst first), record order breaking ties, each step σ times in a row.
 */
export function routeSequence(mechanism: Mechanism, sigma: readonly number[], order: readonly number[]): Step[] {
  const onRoute = mechanism.steps.filter((s) => (sigma[s.index] ?? 0) > 0);
  onRoute.sort((a, b) => rank(order, a.index) - rank(order, b.index) || a.index - b.index);
  return onRoute.flatMap((step) => Array.from({ length: Math.trunc(sigma[step.index]!) }, () => step));
}

function rank(order: readonly number[], index: number): number {
  const position = order[index];
  return position === undefined || !Number.isFinite(position) ? Number.MAX_SAFE_INTEGER : position;
}
