/**
 * Horiuti stoichiometric numbers: how many times each step runs in one turnover of the overall
 * reaction. Given `times` wins; otherwise the route is chosen by the preference order of
 * DESIGN.md item 2 (route-preference.ts). Declared intermediates and catalysts must cancel, but a
 * declaration never makes the finder drop a step: the route is found without the declarations
 * too, and where honouring them would leave out a step that route runs, that route stands and
 * the declarations it cannot honour are reported.
 */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { Rational } from '../exact/rational.ts';
import { declaredChain, detectChain, type ChainStructure } from './chain-structure.ts';
import { findRoute, type Found } from './find-route.ts';
import type { Candidate, RouteStep } from './route-search.ts';
import { SearchBudget } from './search-budget.ts';

export type { RouteStep };

/** Why a declared intermediate or catalyst could not be honoured. */
export type Unhonoured = { kind: 'no-route' } | { kind: 'drops-steps'; steps: number[] };

export interface RouteResult {
  /** σ per step, or undefined when no single route could be chosen. */
  numbers?: number[];
  source: 'given' | 'derived' | 'none';
  /** the chain the route carries, where one is declared or detected */
  chain?: ChainStructure;
  /** declared intermediates and catalysts the route does not let cancel, and why */
  unhonoured: Map<string, Unhonoured>;
  /** the candidate routes of the search that chose σ, best first (empty when σ is given) */
  ranked: Candidate[];
  diagnostics: Diagnostic[];
}

/** What the record says about the route besides its steps. */
export interface RouteOptions {
  /** declared intermediates and catalysts */
  mustCancel?: ReadonlySet<string>;
  /** declared chain carriers (`chain_carrier: true`) */
  carriers?: ReadonlySet<string>;
  /** solvents: never required to cancel */
  inert?: ReadonlySet<string>;
  /** index of the declared rate-determining step */
  rds?: number;
  /** the work the search may spend (search-budget.ts) */
  budget?: SearchBudget;
}

/** Beyond this many steps without `times` the subset search is too large; the record must say. */
export const MAX_SEARCHED_STEPS = 16;

/** Chooses the stoichiometric numbers of a mechanism's steps. */
export function stoichiometricNumbers(steps: readonly RouteStep[], options: RouteOptions = {}): RouteResult {
  const mustCancel = options.mustCancel ?? new Set<string>();
  const carriers = options.carriers ?? new Set<string>();
  const inert = options.inert ?? new Set<string>();
  if (steps.length > 0 && steps.every((s) => s.times !== undefined)) {
    const numbers = steps.map((s) => s.times!);
    if (numbers.every((x) => x === 0)) {
      return failed(
        diagnostic('route/ambiguous', 'error', 'every step has times: 0, so no reaction takes place', {
          path: ['steps'],
        }),
      );
    }
    const sigma = numbers.map(BigInt);
    const chain = carriers.size > 0 ? declaredChain(steps, sigma, carriers) : detectChain(steps, [{ sigma }], inert);
    return { numbers, source: 'given', unhonoured: new Map(), ranked: [], diagnostics: [], ...(chain && { chain }) };
  }
  const free = steps.filter((s) => s.times === undefined).length;
  if (free > MAX_SEARCHED_STEPS) {
    return failed(
      diagnostic('route/search-limit', 'error', `${free} steps are too many to search for a route`, {
        path: ['steps'],
        note: `give each step its times (the search handles up to ${MAX_SEARCHED_STEPS} steps without them)`,
      }),
    );
  }
  const budget = options.budget ?? new SearchBudget();
  const common = { carriers, inert, rds: options.rds, budget };
  const plain = findRoute(steps, { ...common, mustCancel: new Set() });
  if (!plain.complete) return stopped(budget);
  if (mustCancel.size === 0) return result(plain, new Map());
  const held = findRoute(steps, { ...common, mustCancel });
  if (!held.complete) return stopped(budget);
  if (!held.numbers) {
    // No route honours the declarations: the route without them stands, and says what it makes of each.
    if (held.candidates > 0 || !plain.numbers) return result(held, new Map());
    return result(
      plain,
      unhonouredOn(steps, plain.numbers, mustCancel, () => ({ kind: 'no-route' })),
    );
  }
  const dropped = plain.numbers
    ? plain.numbers.flatMap((x, i) => (x > 0 && held.numbers![i] === 0 ? [i + 1] : []))
    : [];
  if (dropped.length > 0) {
    const unhonoured = unhonouredOn(steps, plain.numbers!, mustCancel, () => ({ kind: 'drops-steps', steps: dropped }));
    if (unhonoured.size > 0) return result(plain, unhonoured);
  }
  const out = result(held, new Map());
  if (plain.numbers && plain.numbers.join() !== held.numbers.join()) {
    out.diagnostics.push(
      diagnostic(
        'route/ambiguous',
        'info',
        `the declared intermediates and catalysts choose this route; without the declarations σ would be [${plain.numbers.join(', ')}]`,
        { path: ['steps'], note: 'give times on each step to fix the route explicitly' },
      ),
    );
  }
  return out;
}

/** Declared species that do not cancel along σ, each with its reason. */
function unhonouredOn(
  steps: readonly RouteStep[],
  numbers: readonly number[],
  mustCancel: ReadonlySet<string>,
  reason: () => Unhonoured,
): Map<string, Unhonoured> {
  const out = new Map<string, Unhonoured>();
  for (const sp of mustCancel) {
    const net = steps.reduce(
      (n, s, i) => n.add((s.change.get(sp) ?? Rational.ZERO).mul(Rational.of(numbers[i]!))),
      Rational.ZERO,
    );
    if (!net.isZero()) out.set(sp, reason());
  }
  return out;
}

function result(found: Found, unhonoured: Map<string, Unhonoured>): RouteResult {
  if (!found.numbers) return { source: 'none', unhonoured, ranked: [], diagnostics: found.diagnostics };
  return {
    numbers: found.numbers,
    source: 'derived',
    unhonoured,
    ranked: found.ranked,
    diagnostics: found.diagnostics,
    ...(found.chain && { chain: found.chain }),
  };
}

function stopped(budget: SearchBudget): RouteResult {
  return failed(
    diagnostic(
      'route/search-limit',
      'error',
      `the route search stopped after ${budget.limit} units of work without trying every set of steps, so no route is derived`,
      {
        path: ['steps'],
        note: 'give each step its times (0 for steps off the route); the search is exhaustive only for smaller or less tangled mechanisms',
      },
    ),
  );
}

function failed(d: Diagnostic): RouteResult {
  return { source: 'none', unhonoured: new Map(), ranked: [], diagnostics: [d] };
}
