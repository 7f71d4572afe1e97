/**
 * The search behind the route finder: every connected set of steps (support), and within it the
 * set of species that cancel, best first; each one-dimensional solution is a candidate route
 * scored by what it cancels, each several-dimensional one a family of independent routes.
 * The search spends a measured budget (search-budget.ts) and says when it ran out.
 */
import { rank } from '../exact/linear-algebra.ts';
import { hasNonNegativeKernel, positiveKernel } from '../exact/positive-kernel.ts';
import { Rational } from '../exact/rational.ts';
import { cancelSets, firstChangeSign } from './cancel-sets.ts';
import type { SearchBudget } from './search-budget.ts';

/** A step as the route search sees it. */
export interface RouteStep {
  /** Net change per species (products minus reactants); third bodies net to zero. */
  change: ReadonlyMap<string, Rational>;
  times?: number;
  /** a reversible step also runs backwards (a chain's initiation written as an equilibrium) */
  reversible?: boolean;
}

export interface Candidate {
  sigma: bigint[];
  /** species that cancel and are formed before they are consumed along the route */
  intermediates: number;
  /** species that cancel and are both formed and consumed (solvents never count) */
  cancelled: number;
  plainSum: boolean;
  steps: number;
  size: bigint;
  /** the sum of the overall equation's coefficients: smaller is the more economical account */
  overallSize: number;
  /** steps that only make chain carriers (initiation) or only destroy them (termination); set once the chain is known */
  chainEnds: number;
  /** net reactants of the route that some step of the mechanism makes (not a starting material) */
  madeReactants: number;
}

export interface Family {
  intermediates: number;
  cancelled: number;
  rays: bigint[][];
  /** initiation and termination steps of the chain among its steps; set once the chain is known */
  chainEnds: number;
}

/** What the search found, and whether it looked at every set of steps. */
export interface SearchResult {
  routes: Candidate[];
  families: Family[];
  /** false when the budget ran out before every set of steps was tried */
  complete: boolean;
}

/** What constrains the search. */
export interface SearchOptions {
  /** declared intermediates and catalysts: where a set of steps holds them, they must cancel */
  mustCancel: ReadonlySet<string>;
  /** solvents: they keep their stoichiometry, so they never have to cancel and never count as cancelled */
  inert: ReadonlySet<string>;
  budget: SearchBudget;
}

/** Columns of the search: each step without `times`, plus the given steps as one fixed block. */
export interface Column {
  change: Map<string, Rational>;
  /** σ contributed per unit of this column's multiplicity, per step */
  expand: Map<number, number>;
  required: boolean;
}

/** The columns for steps without `times`; the given ones form one block whose multiplicity must be positive. */
export function routeColumns(steps: readonly RouteStep[], free: number[]): Column[] {
  const columns: Column[] = free.map((i) => ({
    change: new Map(steps[i]!.change),
    expand: new Map([[i, 1]]),
    required: false,
  }));
  const block: Column = { change: new Map(), expand: new Map(), required: true };
  steps.forEach((s, i) => {
    if (s.times === undefined || s.times === 0) return;
    block.expand.set(i, s.times);
    for (const [sp, v] of s.change)
      block.change.set(sp, (block.change.get(sp) ?? Rational.ZERO).add(v.mul(Rational.of(s.times))));
  });
  if (block.expand.size > 0) columns.push(block);
  return columns;
}

/** Every candidate route and family over the connected supports, within the budget. */
export function searchSupports(steps: readonly RouteStep[], columns: Column[], options: SearchOptions): SearchResult {
  const { mustCancel, inert, budget } = options;
  const routes: Candidate[] = [];
  const families: Family[] = [];
  const made = new Set(steps.flatMap((st) => [...st.change].filter(([, v]) => v.sign() > 0).map(([sp]) => sp)));
  const optional = columns.flatMap((c, i) => (c.required ? [] : [i]));
  const required = columns.flatMap((c, i) => (c.required ? [i] : []));
  for (let mask = 0; mask < 1 << optional.length; mask++) {
    const support = [...required, ...optional.filter((_, b) => mask & (1 << b))].sort((a, b) => a - b);
    // A route's steps are linked through shared species; a disconnected set is a sum of separate reactions.
    if (support.length === 0 || !connected(support, columns)) continue;
    const species = [...new Set(support.flatMap((c) => [...columns[c]!.change.keys()]))];
    const matrixFor = (rows: string[]) =>
      rows.map((sp) => support.map((c) => columns[c]!.change.get(sp) ?? Rational.ZERO));
    const whole = matrixFor(species);
    if (!budget.take(kernelCost(whole, support.length))) return { routes, families, complete: false };
    // A set of steps that together change nothing (a step and its reverse, initiation plus termination) is never part of a route.
    if (hasNonNegativeKernel(whole, support.length)) continue;
    const signs = (sp: string) => new Set(support.map((c) => columns[c]!.change.get(sp)?.sign() ?? 0));
    const twoWay = species.filter((sp) => !inert.has(sp) && signs(sp).has(1) && signs(sp).has(-1));
    if ([...mustCancel].some((sp) => species.includes(sp) && !twoWay.includes(sp))) continue;
    const forced = twoWay.filter((sp) => mustCancel.has(sp));
    const choosable = twoWay.filter((sp) => !mustCancel.has(sp));
    const stepsUsed = support.flatMap((c) => [...columns[c]!.expand.keys()]).sort((a, b) => a - b);
    const firstSign = (sp: string) => firstChangeSign(steps, stepsUsed, sp);
    const subsets = cancelSets(choosable, forced, firstSign, budget);
    let best: [number, number] | undefined;
    for (const cancel of subsets) {
      if (
        best &&
        (cancel.species.length < best[0] || (cancel.species.length === best[0] && cancel.intermediates < best[1]))
      )
        break;
      const matrix = matrixFor(cancel.species);
      if (!budget.take(kernelCost(matrix, support.length))) return { routes, families, complete: false };
      const kernel = positiveKernel(matrix, support.length);
      if (kernel.kind === 'none') continue;
      best = [cancel.species.length, cancel.intermediates];
      if (kernel.kind === 'family') {
        const rays = kernel.rays.map((r) => expandSigma(steps.length, columns, support, r));
        families.push({ intermediates: cancel.intermediates, cancelled: cancel.species.length, rays, chainEnds: 0 });
        continue;
      }
      const sigma = expandSigma(steps.length, columns, support, kernel.vector);
      if (!routes.some((r) => r.sigma.join() === sigma.join())) routes.push(scoreRoute(steps, sigma, made, inert));
    }
    if (budget.exhausted) return { routes, families, complete: false };
  }
  return { routes, families, complete: true };
}

/**
 * The work of one kernel in budget units: one for the elimination, and for a kernel of dimension
 * d ≥ 2 the C(n, d − 1) small systems its extreme rays take (positive-kernel.ts).
 */
function kernelCost(matrix: Rational[][], columns: number): number {
  const d = columns - rank(matrix, columns);
  let cost = 1;
  for (let j = 0; j < d - 1; j++) cost = (cost * (columns - j)) / (j + 1);
  return d >= 2 ? 1 + Math.round(cost) : 1;
}

/** True when the columns are linked by shared species into one piece. */
function connected(support: number[], columns: Column[]): boolean {
  const reached = new Set([support[0]!]);
  const species = new Set(columns[support[0]!]!.change.keys());
  for (let grew = true; grew;) {
    grew = false;
    for (const c of support) {
      if (reached.has(c) || ![...columns[c]!.change.keys()].some((sp) => species.has(sp))) continue;
      reached.add(c);
      for (const sp of columns[c]!.change.keys()) species.add(sp);
      grew = true;
    }
  }
  return reached.size === support.length;
}

function expandSigma(n: number, columns: Column[], support: number[], vector: bigint[]): bigint[] {
  const sigma = Array<bigint>(n).fill(0n);
  support.forEach((c, j) => {
    for (const [step, per] of columns[c]!.expand) sigma[step] = sigma[step]! + vector[j]! * BigInt(per);
  });
  return sigma;
}

/** Scores a route by what it cancels, from the σ it actually has. */
export function scoreRoute(
  steps: readonly RouteStep[],
  sigma: bigint[],
  made: ReadonlySet<string>,
  inert: ReadonlySet<string>,
): Candidate {
  const used = sigma.flatMap((s, i) => (s > 0n ? [i] : []));
  const net = new Map<string, Rational>();
  const seenSigns = new Map<string, Set<number>>();
  const first = new Map<string, number>();
  for (const i of used) {
    for (const [sp, v] of steps[i]!.change) {
      if (v.isZero()) continue;
      net.set(sp, (net.get(sp) ?? Rational.ZERO).add(v.mul(Rational.of(sigma[i]!))));
      seenSigns.set(sp, (seenSigns.get(sp) ?? new Set()).add(v.sign()));
      if (!first.has(sp)) first.set(sp, v.sign());
    }
  }
  const cancelledSpecies = [...net]
    .filter(([sp, v]) => v.isZero() && seenSigns.get(sp)!.size === 2 && !inert.has(sp))
    .map(([sp]) => sp);
  return {
    sigma,
    intermediates: cancelledSpecies.filter((sp) => first.get(sp) === 1).length,
    cancelled: cancelledSpecies.length,
    plainSum: sigma.every((s) => s === 1n),
    steps: used.length,
    size: sigma.reduce((a, b) => a + b, 0n),
    overallSize: [...net.values()].reduce((n, v) => n + v.abs().toNumber(), 0),
    chainEnds: 0,
    madeReactants: [...net].filter(([sp, v]) => v.sign() < 0 && made.has(sp)).length,
  };
}
