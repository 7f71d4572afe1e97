/**
 * Declared roles checked against the derived ones: a declaration the route cannot honour is a
 * `roles/declared-mismatch` error at the declaration's line, naming the role the derivation gives
 * and why — never a silent change of the route.
 */
import type { Role } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Rational } from '../exact/rational.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import type { Unhonoured } from './stoichiometric-numbers.ts';

/** Net-zero roles a declared inhibitor may have before the rate law confirms it by a negative order. */
const INHIBITOR_CANDIDATES: ReadonlySet<Role> = new Set(['intermediate', 'catalyst', 'inhibitor', 'off_route']);

/** One error per declared role that differs from the derived one. */
export function declaredMismatches(
  mechanism: Mechanism,
  roles: ReadonlyMap<string, Role>,
  net: ReadonlyMap<string, Rational>,
  unhonoured: ReadonlyMap<string, Unhonoured>,
): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const [symbol, species] of mechanism.species) {
    const declared = species.declaredRole;
    const derived = roles.get(symbol)!;
    if (!declared || declared === derived) continue;
    // An inhibitor is confirmed only by a negative order in the rate law, after the roles.
    if (declared === 'inhibitor' && INHIBITOR_CANDIDATES.has(derived)) continue;
    // A declared intermediate only has to cancel on the route; one that is made and used only off
    // it (a chain's initiation radical, a dead-end complex) does, so the declaration holds and the
    // species keeps the role the route gives it.
    if (declared === 'intermediate' && derived === 'off_route') continue;
    const why = reason(derived, net.get(symbol), unhonoured.get(symbol));
    out.push(
      diagnostic(
        'roles/declared-mismatch',
        'error',
        `${symbol} is declared ${article(declared)}, but ${why}, so it is ${article(derived)}`,
        {
          path: ['species', symbol, 'role'],
          actual: derived,
          expected: declared,
          note:
            derived === 'off_route'
              ? `remove the declaration, declare it off_route, or give times if the steps it is on belong to the route`
              : `correct the declaration, or the steps; the route finder never leaves out a step to make a declaration true`,
        },
      ),
    );
  }
  return out;
}

/** Why the derivation gives a species its role, in words. */
function reason(derived: Role, net: Rational | undefined, why: Unhonoured | undefined): string {
  const change = net && net.sign() > 0 ? 'formed net' : 'consumed net';
  if (why?.kind === 'no-route') return `no route through these steps lets it cancel: it is ${change} on the route`;
  if (why?.kind === 'drops-steps') {
    const steps = why.steps.length === 1 ? `step ${why.steps[0]}` : `steps ${why.steps.join(', ')}`;
    return `it cancels only on a route that leaves out ${steps}; on the route with ${steps} it is ${change}`;
  }
  switch (derived) {
    case 'reactant':
    case 'product':
      return `it is ${change} on the route`;
    case 'intermediate':
      return 'it cancels on the route and is formed before it is used';
    case 'catalyst':
      return 'it cancels on the route and must be present for the route to start';
    case 'off_route':
      return 'it occurs only on steps off the route (σ = 0)';
    case 'third_body':
      return 'it is on both sides of every step it takes part in';
    default:
      return 'the steps say otherwise';
  }
}

/** A role as the object of "is": "a catalyst", "an intermediate", "off the route". */
function article(role: Role): string {
  if (role === 'off_route') return 'off the route';
  const word = role.replace('_', ' ');
  return /^[aeiou]/.test(word) ? `an ${word}` : `a ${word}`;
}
