/**
 * The preference order among candidate routes (DESIGN.md item 2, as built): the hard rules first
 * — the declared rate-determining step is on the route, a single side step is never the whole
 * route — then the ranking: a chain's initiation and termination stay off the route (the
 * long-chain convention, common practice); the most species cancelled; the fewest net reactants
 * that the mechanism itself makes (a route starts from starting materials, so a dead-end complex
 * or a bound catalyst is not one); the most species formed before they are consumed (a route
 * that stops at the enol, short of the iodination that uses it, cancels fewer of them); the most
 * economical overall equation; the plain sum; the fewest steps; the smallest numbers.
 */
import type { Candidate, Family, RouteStep } from './route-search.ts';

/** The ranking criteria in order, each with the words that say why the better route wins. */
const CRITERIA: readonly { better: (a: Candidate, b: Candidate) => number; why: string }[] = [
  { better: (a, b) => a.chainEnds - b.chainEnds, why: 'it starts or ends chains, which stays off the route' },
  { better: (a, b) => b.cancelled - a.cancelled, why: 'it cancels fewer species' },
  {
    better: (a, b) => a.madeReactants - b.madeReactants,
    why: 'it starts from a species that the mechanism itself makes',
  },
  { better: (a, b) => b.intermediates - a.intermediates, why: 'fewer of its species are formed before they are used' },
  { better: (a, b) => a.overallSize - b.overallSize, why: 'its overall equation is larger' },
  { better: (a, b) => Number(b.plainSum) - Number(a.plainSum), why: 'it is not the plain sum of its steps' },
  { better: (a, b) => a.steps - b.steps, why: 'it needs more steps' },
  { better: (a, b) => (a.size < b.size ? -1 : a.size > b.size ? 1 : 0), why: 'its numbers are larger' },
];

/** Negative when `a` is the preferred route. */
export function compareCandidates(a: Candidate, b: Candidate): number {
  for (const c of CRITERIA) {
    const d = c.better(a, b);
    if (d !== 0) return d;
  }
  return 0;
}

/** Why the route `chosen` is preferred to `other`, in words about `other`. */
export function whyNotPreferred(chosen: Candidate, other: Candidate): string {
  return CRITERIA.find((c) => c.better(chosen, other) < 0)?.why ?? 'it ranks equal';
}

/** Candidates that run the declared rate-determining step, when any does (otherwise all, and step/rds says so). */
export function throughRds<T extends { sigma?: bigint[]; rays?: bigint[][] }>(
  items: T[],
  rds: number | undefined,
): T[] {
  if (rds === undefined) return items;
  const runs = (item: T) => (item.sigma ? item.sigma[rds]! > 0n : (item.rays ?? []).some((r) => r[rds]! > 0n));
  return items.some(runs) ? items.filter(runs) : items;
}

/**
 * Drops a one-step route whose step uses up a species other steps make (a neutralisation of a
 * by-product) when a longer route runs that step too: a single side step is never the whole route.
 */
export function withoutLoneSideSteps(
  routes: Candidate[],
  families: readonly Family[],
  steps: readonly RouteStep[],
): Candidate[] {
  return routes.filter((r) => {
    if (r.steps !== 1) return true;
    const i = r.sigma.findIndex((s) => s > 0n);
    const usesMade = [...steps[i]!.change].some(
      ([sp, v]) => v.sign() < 0 && steps.some((other, j) => j !== i && makes(other, sp)),
    );
    if (!usesMade) return true;
    const longer =
      routes.some((o) => o !== r && o.steps > 1 && o.sigma[i]! > 0n) ||
      families.some((f) => f.rays.some((ray) => ray[i]! > 0n && ray.filter((x) => x > 0n).length > 1));
    return !longer;
  });
}

/** True when a step makes the species (forwards, or backwards when reversible). */
function makes(step: RouteStep, sp: string): boolean {
  const v = step.change.get(sp);
  return v !== undefined && (v.sign() > 0 || (step.reversible === true && v.sign() < 0));
}
