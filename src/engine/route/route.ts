/**
 * The route stage of a derivation: Horiuti stoichiometric numbers, the overall equation, the
 * roles, and the order in which the steps run, gathered into one `Route` value. Later stages
 * (rate laws, energies, simulations) take this narrow value, never the derivation being built.
 */
import type { Diagnostic, Role } from '../../model/index.ts';
import type { Mechanism, Step } from '../mechanism/mechanism.ts';
import { overallEquation, type OverallEquation } from './overall-equation.ts';
import { deriveRoles } from './roles.ts';
import { stoichiometricNumbers } from './stoichiometric-numbers.ts';

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
}

/** Chooses the route of a mechanism and reads its overall equation and roles. */
export function deriveRoute(mechanism: Mechanism): { route?: Route; diagnostics: Diagnostic[] } {
  const species = [...mechanism.species.values()];
  const mustCancel = new Set(
    species.filter((s) => s.declaredRole === 'intermediate' || s.declaredRole === 'catalyst').map((s) => s.symbol),
  );
  const carriers = new Set(species.filter((s) => s.declaredRole === 'intermediate').map((s) => s.symbol));
  const chosen = stoichiometricNumbers(mechanism.steps, mustCancel, carriers);
  const diagnostics = [...chosen.diagnostics];
  if (!chosen.numbers) return { diagnostics };
  const sigma = chosen.numbers;
  const { roles, offRoute, routeOrder, diagnostics: roleDiagnostics } = deriveRoles(mechanism, sigma);
  diagnostics.push(...roleDiagnostics);
  // Only catalysts on the route go over the arrow; a binder off the route (an inhibitor) does not.
  const catalysts = [...roles].filter(([sp, r]) => r === 'catalyst' && !offRoute.has(sp)).map(([sp]) => sp);
  const route: Route = {
    sigma,
    source: chosen.source === 'given' ? 'given' : 'derived',
    order: routeOrder,
    sequence: routeSequence(mechanism, sigma, routeOrder),
    overall: overallEquation(mechanism, sigma, catalysts),
    roles,
    offRoute,
  };
  return { route, diagnostics };
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
