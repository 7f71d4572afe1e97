/**
 * Horiuti stoichiometric numbers: how many times each step runs in one turnover of the overall
 * reaction. Given `times` wins; otherwise the route is chosen by the preference order of
 * DESIGN.md item 2, searching supports (sets of steps) and the species each route cancels.
 */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { Rational } from '../exact/rational.ts';
import { routeColumns, searchSupports, type Candidate, type Family, type RouteStep } from './route-search.ts';

export type { RouteStep };

export interface RouteResult {
  /** σ per step, or undefined when no single route could be chosen. */
  numbers?: number[];
  source: 'given' | 'derived' | 'none';
  diagnostics: Diagnostic[];
}

/** Beyond this many steps without `times` the subset search is too large; the record must say. */
export const MAX_SEARCHED_STEPS = 16;

/** Chooses the stoichiometric numbers of a mechanism's steps. */
export function stoichiometricNumbers(
  steps: readonly RouteStep[],
  mustCancel: ReadonlySet<string>,
  carriers: ReadonlySet<string> = new Set(),
): RouteResult {
  if (steps.length > 0 && steps.every((s) => s.times !== undefined)) {
    const numbers = steps.map((s) => s.times!);
    if (numbers.every((x) => x === 0)) {
      return failed(
        diagnostic('route/ambiguous', 'error', 'every step has times: 0, so no reaction takes place', {
          path: ['steps'],
        }),
      );
    }
    return { numbers, source: 'given', diagnostics: [] };
  }
  const free = steps.flatMap((s, i) => (s.times === undefined ? [i] : []));
  if (free.length > MAX_SEARCHED_STEPS) {
    return failed(
      diagnostic(
        'route/ambiguous',
        'error',
        `${free.length} steps are too many to search for a route; give each step its times`,
        {
          path: ['steps'],
        },
      ),
    );
  }
  const columns = routeColumns(steps, free);
  const { routes, families } = searchSupports(steps, columns, mustCancel, carriers);
  const chosen = chooseRoute(routes, families, mustCancel, steps);
  if (chosen.numbers) chosen.diagnostics.push(...separateReactions(steps, chosen.numbers));
  return chosen;
}

/** Off-route steps that share no species with the route describe a separate reaction: say so. */
function separateReactions(steps: readonly RouteStep[], numbers: number[]): Diagnostic[] {
  const onRoute = new Set(steps.flatMap((s, i) => (numbers[i]! > 0 ? [...s.change.keys()] : [])));
  return steps.flatMap((s, i) =>
    numbers[i] === 0 && s.change.size > 0 && ![...s.change.keys()].some((sp) => onRoute.has(sp))
      ? [
          diagnostic(
            'route/ambiguous',
            'warning',
            `step ${i + 1} shares no species with the route: it describes a separate reaction and is left off (σ = 0)`,
            { path: ['steps', i], note: 'give times on each step to include it' },
          ),
        ]
      : [],
  );
}

function chooseRoute(
  routes: Candidate[],
  families: Family[],
  mustCancel: ReadonlySet<string>,
  steps: readonly RouteStep[],
): RouteResult {
  if (routes.length === 0 && families.length === 0) {
    const declared = [...mustCancel].join(', ');
    return failed(
      diagnostic(
        'route/ambiguous',
        'error',
        declared
          ? `no route lets every declared intermediate and catalyst cancel (${declared})`
          : 'no set of steps gives a net reaction',
        {
          path: ['steps'],
          note: 'check the declared roles, or give each step its times',
        },
      ),
    );
  }
  const ranked = [...routes].sort(compareCandidates);
  const best = ranked[0];
  // A family (a sum of independent routes) only stands in the way when it cancels strictly more.
  const better = families.filter(
    (f) => !best || f.chainEnds < best.chainEnds || (f.chainEnds === best.chainEnds && f.cancelled > best.cancelled),
  );
  const ties = best ? ranked.filter((c) => compareCandidates(c, best) === 0) : [];
  if (best && better.length === 0 && ties.length === 1)
    return { numbers: best.sigma.map(Number), source: 'derived', diagnostics: [] };
  const competing = [...ties.map((c) => c.sigma), ...better.flatMap((f) => f.rays)];
  // Parallel paths to one and the same overall reaction (random-order binding, two colliders) are
  // not a choice between reactions: follow the best-ranked path and say which steps run beside it.
  if (best && sameOverall(steps, [best.sigma, ...competing])) {
    const beside = steps.flatMap((_, i) => (best.sigma[i] === 0n && competing.some((s) => s[i]! > 0n) ? [i + 1] : []));
    return {
      numbers: best.sigma.map(Number),
      source: 'derived',
      diagnostics: [
        diagnostic(
          'route/ambiguous',
          'info',
          `steps ${beside.join(', ')} form a parallel path to the same overall reaction; σ follows the path through steps ${best.sigma.flatMap((x, i) => (x > 0n ? [i + 1] : [])).join(', ')}`,
          {
            path: ['steps'],
            note: 'the steady-state rate law includes every path; give times to choose another',
          },
        ),
      ],
    };
  }
  const alternatives = [...new Set(competing.map((a) => `[${a.join(', ')}]`))];
  const listed = alternatives.slice(0, 4).join(' or ');
  return failed(
    diagnostic(
      'route/ambiguous',
      'error',
      `the steps allow several independent routes (${listed}); say which with times on each step`,
      {
        path: ['steps'],
        expected: 'times on every step',
      },
    ),
  );
}

/**
 * The preference order: declared chain carriers' initiation and termination stay off the route
 * (the long-chain convention, common practice); the most species cancelled; the fewest net
 * reactants that the mechanism itself makes (a route starts from starting materials, so a dead-end
 * complex or a bound catalyst is not one); the most economical overall equation; the most species
 * formed before they are consumed; the plain sum; the fewest steps; the smallest numbers.
 */
/** True when every σ gives the same overall equation, up to a positive factor. */
function sameOverall(steps: readonly RouteStep[], sigmas: bigint[][]): boolean {
  const direction = (sigma: bigint[]) => {
    const net = new Map<string, Rational>();
    steps.forEach((step, i) => {
      for (const [sp, v] of step.change) net.set(sp, (net.get(sp) ?? Rational.ZERO).add(v.mul(Rational.of(sigma[i]!))));
    });
    const entries = [...net].filter(([, v]) => !v.isZero()).sort(([a], [b]) => (a < b ? -1 : 1));
    const scale = entries[0]?.[1].abs();
    return entries.map(([sp, v]) => `${sp}:${scale ? v.div(scale).toString() : '0'}`).join(' ');
  };
  const first = direction(sigmas[0]!);
  return first !== '' && sigmas.every((s) => direction(s) === first);
}

function compareCandidates(a: Candidate, b: Candidate): number {
  return (
    a.chainEnds - b.chainEnds ||
    b.cancelled - a.cancelled ||
    a.madeReactants - b.madeReactants ||
    a.overallSize - b.overallSize ||
    b.intermediates - a.intermediates ||
    Number(b.plainSum) - Number(a.plainSum) ||
    a.steps - b.steps ||
    (a.size < b.size ? -1 : a.size > b.size ? 1 : 0)
  );
}

function failed(d: Diagnostic): RouteResult {
  return { source: 'none', diagnostics: [d] };
}
