/**
 * The search behind the route finder: every connected set of steps (support), and within it the
 * set of species that cancel, best first; each one-dimensional solution is a candidate route
 * scored by what it cancels, each several-dimensional one a family of independent routes.
 */
import { hasNonNegativeKernel, positiveKernel } from '../exact/positive-kernel.ts';
import { Rational } from '../exact/rational.ts';

/** A step as the route search sees it. */
export interface RouteStep {
  /** Net change per species (products minus reactants); third bodies net to zero. */
  change: ReadonlyMap<string, Rational>;
  times?: number;
}

export interface Candidate {
  sigma: bigint[];
  /** species that cancel and are formed before they are consumed along the route */
  intermediates: number;
  /** species that cancel and are both formed and consumed */
  cancelled: number;
  plainSum: boolean;
  steps: number;
  size: bigint;
  /** the sum of the overall equation's coefficients: smaller is the more economical account */
  overallSize: number;
  /** steps that only make declared chain carriers (initiation) or only destroy them (termination) */
  chainEnds: number;
  /** net reactants of the route that some step of the mechanism makes (not a starting material) */
  madeReactants: number;
}

export interface Family {
  intermediates: number;
  cancelled: number;
  rays: bigint[][];
  /** initiation and termination steps of declared carriers among its steps */
  chainEnds: number;
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

/** Every candidate route and family over the connected supports. */
export function searchSupports(
  steps: readonly RouteStep[],
  columns: Column[],
  mustCancel: ReadonlySet<string>,
  carriers: ReadonlySet<string> = new Set(),
) {
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
    // A set of steps that together change nothing (a step and its reverse, initiation plus termination) is never part of a route.
    if (hasNonNegativeKernel(matrixFor(species), support.length)) continue;
    const signs = (sp: string) => new Set(support.map((c) => columns[c]!.change.get(sp)?.sign() ?? 0));
    const twoWay = species.filter((sp) => signs(sp).has(1) && signs(sp).has(-1));
    if ([...mustCancel].some((sp) => species.includes(sp) && !twoWay.includes(sp))) continue;
    const forced = twoWay.filter((sp) => mustCancel.has(sp));
    const choosable = twoWay.filter((sp) => !mustCancel.has(sp));
    const stepsUsed = support.flatMap((c) => [...columns[c]!.expand.keys()]).sort((a, b) => a - b);
    const firstSign = (sp: string) => firstChangeSign(steps, stepsUsed, sp);
    const subsets = cancelSets(choosable, forced, firstSign);
    let best: [number, number] | undefined;
    for (const cancel of subsets) {
      if (
        best &&
        (cancel.species.length < best[0] || (cancel.species.length === best[0] && cancel.intermediates < best[1]))
      )
        break;
      const kernel = positiveKernel(matrixFor(cancel.species), support.length);
      if (kernel.kind === 'none') continue;
      best = [cancel.species.length, cancel.intermediates];
      if (kernel.kind === 'family') {
        const rays = kernel.rays.map((r) => expandSigma(steps.length, columns, support, r));
        const used = steps.flatMap((st, i) =>
          rays.some((r) => r[i]! > 0n) && carriers.size > 0 && isChainEnd(st, carriers) ? [i] : [],
        );
        families.push({
          intermediates: cancel.intermediates,
          cancelled: cancel.species.length,
          rays,
          chainEnds: used.length,
        });
        continue;
      }
      const sigma = expandSigma(steps.length, columns, support, kernel.vector);
      if (!routes.some((r) => r.sigma.join() === sigma.join())) routes.push(scoreRoute(steps, sigma, carriers, made));
    }
  }
  return { routes, families };
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

/**
 * Subsets of the species that may cancel, best first: most species, then most of the
 * intermediate pattern. Generated lazily, because the first feasible set is almost always the full one.
 */
function* cancelSets(
  choosable: string[],
  forced: string[],
  firstSign: (sp: string) => number,
): Generator<{ species: string[]; intermediates: number }> {
  const forcedIntermediates = forced.filter((sp) => firstSign(sp) > 0).length;
  for (let drop = 0; drop <= choosable.length; drop++) {
    const sets = [...combinationsOf(choosable, choosable.length - drop)].map((kept) => ({
      species: [...forced, ...kept],
      intermediates: forcedIntermediates + kept.filter((sp) => firstSign(sp) > 0).length,
    }));
    yield* sets.sort((a, b) => b.intermediates - a.intermediates);
  }
}

function* combinationsOf<T>(items: readonly T[], k: number, start = 0, picked: T[] = []): Generator<T[]> {
  if (picked.length === k) {
    yield [...picked];
    return;
  }
  for (let i = start; i <= items.length - (k - picked.length); i++) {
    picked.push(items[i]!);
    yield* combinationsOf(items, k, i + 1, picked);
    picked.pop();
  }
}

/** +1 when the species is formed before it is consumed along the steps (in record order), −1 otherwise. */
function firstChangeSign(steps: readonly RouteStep[], stepIndices: number[], sp: string): number {
  for (const i of stepIndices) {
    const v = steps[i]!.change.get(sp);
    if (v && !v.isZero()) return v.sign();
  }
  return 0;
}

function expandSigma(n: number, columns: Column[], support: number[], vector: bigint[]): bigint[] {
  const sigma = Array<bigint>(n).fill(0n);
  support.forEach((c, j) => {
    for (const [step, per] of columns[c]!.expand) sigma[step] = sigma[step]! + vector[j]! * BigInt(per);
  });
  return sigma;
}

/** Scores a route by what it cancels, from the σ it actually has. */
function scoreRoute(
  steps: readonly RouteStep[],
  sigma: bigint[],
  carriers: ReadonlySet<string>,
  made: ReadonlySet<string>,
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
  const cancelledSpecies = [...net].filter(([sp, v]) => v.isZero() && seenSigns.get(sp)!.size === 2).map(([sp]) => sp);
  return {
    sigma,
    intermediates: cancelledSpecies.filter((sp) => first.get(sp) === 1).length,
    cancelled: cancelledSpecies.length,
    plainSum: sigma.every((s) => s === 1n),
    steps: used.length,
    size: sigma.reduce((a, b) => a + b, 0n),
    overallSize: [...net.values()].reduce((n, v) => n + v.abs().toNumber(), 0),
    chainEnds: carriers.size === 0 ? 0 : used.filter((i) => isChainEnd(steps[i]!, carriers)).length,
    madeReactants: [...net].filter(([sp, v]) => v.sign() < 0 && made.has(sp)).length,
  };
}

/** Initiation makes carriers from none; termination destroys carriers and makes none. */
function isChainEnd(step: RouteStep, carriers: ReadonlySet<string>): boolean {
  const made = [...step.change].filter(([, v]) => v.sign() > 0).map(([sp]) => sp);
  const used = [...step.change].filter(([, v]) => v.sign() < 0).map(([sp]) => sp);
  const initiation = made.some((sp) => carriers.has(sp)) && !used.some((sp) => carriers.has(sp));
  const termination = used.some((sp) => carriers.has(sp)) && !made.some((sp) => carriers.has(sp));
  return initiation || termination;
}
