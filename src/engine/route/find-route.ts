/**
 * One pass of the route finder: search the sets of steps, keep the routes through the declared
 * rate-determining step, drop lone side steps, find the chain (declared or detected) and rank
 * the routes by the preference order; then pick the best, or say why no single route stands out.
 */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { Rational } from '../exact/rational.ts';
import { chainEnd, countChainEnds, declaredChain, detectChain, type ChainStructure } from './chain-structure.ts';
import { compareCandidates, throughRds, withoutLoneSideSteps } from './route-preference.ts';
import { routeColumns, searchSupports, type Candidate, type Family, type RouteStep } from './route-search.ts';
import type { SearchBudget } from './search-budget.ts';

/** What one pass found. */
export interface Found {
  numbers?: number[];
  best?: Candidate;
  /** every candidate route, best first (for saying why a step is off the route) */
  ranked: Candidate[];
  /** how many routes and families the search found at all */
  candidates: number;
  complete: boolean;
  chain?: ChainStructure;
  diagnostics: Diagnostic[];
}

export interface FindOptions {
  mustCancel: ReadonlySet<string>;
  carriers: ReadonlySet<string>;
  inert: ReadonlySet<string>;
  rds: number | undefined;
  budget: SearchBudget;
}

/** Finds the preferred route under one set of constraints. */
export function findRoute(steps: readonly RouteStep[], options: FindOptions): Found {
  const free = steps.flatMap((s, i) => (s.times === undefined ? [i] : []));
  const search = searchSupports(steps, routeColumns(steps, free), options);
  const none = { ranked: [], candidates: search.routes.length + search.families.length, diagnostics: [] };
  if (!search.complete) return { ...none, complete: false };
  const families = throughRds(search.families, options.rds);
  const routes = withoutLoneSideSteps(throughRds(search.routes, options.rds), families, steps).sort(compareCandidates);
  const detected = options.carriers.size > 0 ? undefined : detectChain(steps, routes, options.inert);
  rankByChain(steps, routes, families, options.carriers.size > 0 ? options.carriers : new Set(detected?.carriers));
  // A detected chain must then be the route: where the long-chain ranking prefers another route,
  // the steps are not a chain after all (a mesh of cycles), and the plain ranking stands.
  const support = (sigma: readonly bigint[]) => sigma.flatMap((x, i) => (x > 0n ? [i] : [])).join();
  if (detected && routes[0] && support(routes[0].sigma) !== detected.propagation.join())
    rankByChain(steps, routes, families, new Set());
  const chosen = chooseRoute(routes, families, options.mustCancel, steps);
  const found: Found = { ...none, ranked: routes, complete: true, diagnostics: chosen.diagnostics };
  if (!chosen.best) return found;
  const sigma = chosen.best.sigma;
  const chain =
    options.carriers.size > 0
      ? declaredChain(steps, sigma, options.carriers)
      : detectChain(steps, [{ sigma }], options.inert);
  return { ...found, numbers: sigma.map(Number), best: chosen.best, ...(chain && { chain }) };
}

/** Counts each route's and family's chain ends for these carriers, and ranks the routes again. */
function rankByChain(
  steps: readonly RouteStep[],
  routes: Candidate[],
  families: Family[],
  carriers: ReadonlySet<string>,
): void {
  for (const r of routes) r.chainEnds = countChainEnds(steps, r.sigma, carriers);
  for (const f of families)
    f.chainEnds =
      carriers.size === 0
        ? 0
        : steps.filter((st, i) => f.rays.some((r) => r[i]! > 0n) && chainEnd(st, carriers)).length;
  routes.sort(compareCandidates);
}

function chooseRoute(
  routes: Candidate[],
  families: Family[],
  mustCancel: ReadonlySet<string>,
  steps: readonly RouteStep[],
): { best?: Candidate; diagnostics: Diagnostic[] } {
  if (routes.length === 0 && families.length === 0) {
    const declared = [...mustCancel].join(', ');
    return {
      diagnostics: [
        diagnostic(
          'route/ambiguous',
          'error',
          declared
            ? `no route lets every declared intermediate and catalyst cancel (${declared})`
            : 'no set of steps gives a net reaction',
          { path: ['steps'], note: 'check the declared roles, or give each step its times' },
        ),
      ],
    };
  }
  const best = routes[0];
  // A family (a sum of independent routes) only stands in the way when it cancels strictly more.
  const better = families.filter(
    (f) => !best || f.chainEnds < best.chainEnds || (f.chainEnds === best.chainEnds && f.cancelled > best.cancelled),
  );
  const ties = best ? routes.filter((c) => compareCandidates(c, best) === 0) : [];
  if (best && better.length === 0 && ties.length === 1) return { best, diagnostics: [] };
  const competing = [...ties.map((c) => c.sigma), ...better.flatMap((f) => f.rays)];
  // Parallel paths to one and the same overall reaction (random-order binding, two colliders) are
  // not a choice between reactions: follow the best-ranked path and say which steps run beside it.
  if (best && sameOverall(steps, [best.sigma, ...competing])) {
    const beside = steps.flatMap((_, i) => (best.sigma[i] === 0n && competing.some((s) => s[i]! > 0n) ? [i + 1] : []));
    const path = best.sigma.flatMap((x, i) => (x > 0n ? [i + 1] : [])).join(', ');
    return {
      best,
      diagnostics: [
        diagnostic(
          'route/ambiguous',
          'info',
          `steps ${beside.join(', ')} form a parallel path to the same overall reaction; σ follows the path through steps ${path}`,
          { path: ['steps'], note: 'the steady-state rate law includes every path; give times to choose another' },
        ),
      ],
    };
  }
  const alternatives = [...new Set(competing.map((a) => `[${a.join(', ')}]`))];
  return {
    diagnostics: [
      diagnostic(
        'route/ambiguous',
        'error',
        `the steps allow several independent routes (${alternatives.slice(0, 4).join(' or ')}); say which with times on each step`,
        { path: ['steps'], expected: 'times on every step' },
      ),
    ],
  };
}

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
