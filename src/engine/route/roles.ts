/**
 * Roles of species (DESIGN.md item 3), derived from the route: net consumed → reactant,
 * net formed → product, net zero → catalyst when it must be present for the route to start
 * (see catalyst-seeds.ts), otherwise intermediate.
 * A solvent keeps its stoichiometry but is named as such; a species on both sides of every
 * step it takes part in is a third body. Declared roles are checked against the derived ones.
 */
import type { Role } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import { walkRoute } from './walk-route.ts';
import { netOverRoute } from './overall-equation.ts';

const NET_ZERO_KINDS: ReadonlySet<Role> = new Set(['intermediate', 'catalyst', 'inhibitor']);

/** Derives the role of every species; `offRoute` lists net-zero species that only occur in steps with σ = 0. */
export function deriveRoles(
  mechanism: Mechanism,
  sigma: readonly number[],
): { roles: Map<string, Role>; offRoute: Set<string>; routeOrder: number[]; diagnostics: Diagnostic[] } {
  const net = netOverRoute(mechanism, sigma);
  const roles = new Map<string, Role>();
  const offRoute = new Set<string>();
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
    else {
      if (firstOnRoute === 0) offRoute.add(symbol);
      const oneWay = oneWaySign(mechanism, symbol);
      // Off the route: a species only ever made by one-way steps is a side product (a termination
      // product); only ever used up, a side reactant; a binder that nothing makes (a free inhibitor)
      // is consumed first; what such binding makes is an intermediate (a dead-end complex).
      if (firstOnRoute === 0 && oneWay !== 0) role = oneWay > 0 ? 'product' : 'reactant';
      else
        role =
          firstOnRoute === 0
            ? firstAnywhere > 0
              ? 'intermediate'
              : 'catalyst'
            : seeds.has(symbol)
              ? 'catalyst'
              : 'intermediate';
      // The record decides between the net-zero kinds where it says.
      if (species.declaredRole === 'intermediate' || species.declaredRole === 'catalyst') role = species.declaredRole;
    }
    roles.set(symbol, role);
  }
  for (const [symbol, role] of roles) if (role === 'product' || role === 'reactant') offRoute.delete(symbol);
  return { roles, offRoute, routeOrder: order, diagnostics: declaredMismatches(mechanism, roles) };
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

function declaredMismatches(mechanism: Mechanism, roles: Map<string, Role>): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const [symbol, species] of mechanism.species) {
    const declared = species.declaredRole;
    const derived = roles.get(symbol)!;
    if (!declared || declared === derived) continue;
    // An inhibitor is confirmed only by a negative order in the rate law, after the roles.
    if (declared === 'inhibitor' && NET_ZERO_KINDS.has(derived)) continue;
    out.push(
      diagnostic(
        'roles/declared-mismatch',
        'error',
        `${symbol} is declared ${article(declared)} but the steps make it ${article(derived)}`,
        {
          path: ['species', symbol, 'role'],
          actual: derived,
          expected: declared,
        },
      ),
    );
  }
  return out;
}

function article(role: Role): string {
  const word = role.replace('_', ' ');
  return /^[aeiou]/.test(word) ? `an ${word}` : `a ${word}`;
}
