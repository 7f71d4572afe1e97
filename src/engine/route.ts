/**
 * Horiuti stoichiometric numbers: how many times each step runs in one turnover of the overall
 * reaction. Given `times` wins; otherwise the route is chosen by the preference order of
 * DESIGN.md item 2, searching supports (sets of steps) and the species each route cancels.
 */
import { diagnostic, type Diagnostic } from './diagnostic.ts';
import { hasNonNegativeKernel, positiveKernel } from './positive-kernel.ts';
import { Rational } from './rational.ts';

export interface RouteStep {
  /** Net change per species (products minus reactants); third bodies net to zero. */
  change: ReadonlyMap<string, Rational>;
  times?: number;
}

export interface RouteResult {
  /** σ per step, or undefined when no single route could be chosen. */
  numbers?: number[];
  source: 'given' | 'derived' | 'none';
  diagnostics: Diagnostic[];
}

interface Candidate {
  sigma: bigint[];
  /** species that cancel and are formed before they are consumed along the route */
  intermediates: number;
  /** species that cancel and are both formed and consumed */
  cancelled: number;
  plainSum: boolean;
  steps: number;
  size: bigint;
}

/** Beyond this many steps without `times` the subset search is too large; the record must say. */
export const MAX_SEARCHED_STEPS = 16;

/** Chooses the stoichiometric numbers of a mechanism's steps. */
export function stoichiometricNumbers(steps: readonly RouteStep[], mustCancel: ReadonlySet<string>): RouteResult {
  if (steps.length > 0 && steps.every((s) => s.times !== undefined)) {
    const numbers = steps.map((s) => s.times!);
    if (numbers.every((x) => x === 0)) {
      return failed(diagnostic('route/ambiguous', 'error', 'every step has times: 0, so no reaction takes place', { path: ['steps'] }));
    }
    return { numbers, source: 'given', diagnostics: [] };
  }
  const free = steps.flatMap((s, i) => (s.times === undefined ? [i] : []));
  if (free.length > MAX_SEARCHED_STEPS) {
    return failed(
      diagnostic('route/ambiguous', 'error', `${free.length} steps are too many to search for a route; give each step its times`, {
        path: ['steps'],
      }),
    );
  }
  const columns = routeColumns(steps, free);
  const { routes, families } = searchSupports(steps, columns, mustCancel);
  const chosen = chooseRoute(routes, families, mustCancel);
  if (chosen.numbers) chosen.diagnostics.push(...separateReactions(steps, chosen.numbers));
  return chosen;
}

/** Off-route steps that share no species with the route describe a separate reaction: say so. */
function separateReactions(steps: readonly RouteStep[], numbers: number[]): Diagnostic[] {
  const onRoute = new Set(steps.flatMap((s, i) => (numbers[i]! > 0 ? [...s.change.keys()] : [])));
  return steps.flatMap((s, i) =>
    numbers[i] === 0 && s.change.size > 0 && ![...s.change.keys()].some((sp) => onRoute.has(sp))
      ? [diagnostic('route/ambiguous', 'warning', `step ${i + 1} shares no species with the route: it describes a separate reaction and is left off (σ = 0)`, { path: ['steps', i], note: 'give times on each step to include it' })]
      : [],
  );
}

/** Columns of the search: each step without `times`, plus the given steps as one fixed block. */
interface Column {
  change: Map<string, Rational>;
  /** σ contributed per unit of this column's multiplicity, per step */
  expand: Map<number, number>;
  required: boolean;
}

function routeColumns(steps: readonly RouteStep[], free: number[]): Column[] {
  const columns: Column[] = free.map((i) => ({ change: new Map(steps[i]!.change), expand: new Map([[i, 1]]), required: false }));
  const block: Column = { change: new Map(), expand: new Map(), required: true };
  steps.forEach((s, i) => {
    if (s.times === undefined || s.times === 0) return;
    block.expand.set(i, s.times);
    for (const [sp, v] of s.change) block.change.set(sp, (block.change.get(sp) ?? Rational.ZERO).add(v.mul(Rational.of(s.times))));
  });
  if (block.expand.size > 0) columns.push(block);
  return columns;
}

function searchSupports(steps: readonly RouteStep[], columns: Column[], mustCancel: ReadonlySet<string>) {
  const routes: Candidate[] = [];
  const families: { intermediates: number; cancelled: number; rays: bigint[][] }[] = [];
  const optional = columns.flatMap((c, i) => (c.required ? [] : [i]));
  const required = columns.flatMap((c, i) => (c.required ? [i] : []));
  for (let mask = 0; mask < 1 << optional.length; mask++) {
    const support = [...required, ...optional.filter((_, b) => mask & (1 << b))].sort((a, b) => a - b);
    // A route's steps are linked through shared species; a disconnected set is a sum of separate reactions.
    if (support.length === 0 || !connected(support, columns)) continue;
    const species = [...new Set(support.flatMap((c) => [...columns[c]!.change.keys()]))];
    const matrixFor = (rows: string[]) => rows.map((sp) => support.map((c) => columns[c]!.change.get(sp) ?? Rational.ZERO));
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
      if (best && (cancel.intermediates < best[0] || (cancel.intermediates === best[0] && cancel.species.length < best[1]))) break;
      const kernel = positiveKernel(matrixFor(cancel.species), support.length);
      if (kernel.kind === 'none') continue;
      best = [cancel.intermediates, cancel.species.length];
      if (kernel.kind === 'family') {
        families.push({ intermediates: cancel.intermediates, cancelled: cancel.species.length, rays: kernel.rays.map((r) => expandSigma(steps.length, columns, support, r)) });
        continue;
      }
      const sigma = expandSigma(steps.length, columns, support, kernel.vector);
      if (!routes.some((r) => r.sigma.join() === sigma.join())) routes.push(scoreRoute(steps, sigma));
    }
  }
  return { routes, families };
}

/** True when the columns are linked by shared species into one piece. */
function connected(support: number[], columns: Column[]): boolean {
  const reached = new Set([support[0]!]);
  const species = new Set(columns[support[0]!]!.change.keys());
  for (let grew = true; grew; ) {
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
 * Subsets of the species that may cancel, best first: most intermediate-pattern species, then
 * most species. Generated lazily, because the first feasible set is almost always the full one.
 */
function* cancelSets(choosable: string[], forced: string[], firstSign: (sp: string) => number): Generator<{ species: string[]; intermediates: number }> {
  const formedFirst = choosable.filter((sp) => firstSign(sp) > 0);
  const consumedFirst = choosable.filter((sp) => firstSign(sp) <= 0);
  const forcedIntermediates = forced.filter((sp) => firstSign(sp) > 0).length;
  for (let dropI = 0; dropI <= formedFirst.length; dropI++) {
    for (const keptI of combinationsOf(formedFirst, formedFirst.length - dropI)) {
      for (let dropC = 0; dropC <= consumedFirst.length; dropC++) {
        for (const keptC of combinationsOf(consumedFirst, consumedFirst.length - dropC)) {
          yield { species: [...forced, ...keptI, ...keptC], intermediates: forcedIntermediates + keptI.length };
        }
      }
    }
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
function scoreRoute(steps: readonly RouteStep[], sigma: bigint[]): Candidate {
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
  };
}

function chooseRoute(routes: Candidate[], families: { intermediates: number; cancelled: number; rays: bigint[][] }[], mustCancel: ReadonlySet<string>): RouteResult {
  if (routes.length === 0 && families.length === 0) {
    const declared = [...mustCancel].join(', ');
    return failed(
      diagnostic('route/ambiguous', 'error', declared ? `no route lets every declared intermediate and catalyst cancel (${declared})` : 'no set of steps gives a net reaction', {
        path: ['steps'],
        note: 'check the declared roles, or give each step its times',
      }),
    );
  }
  const ranked = [...routes].sort(compareCandidates);
  const best = ranked[0];
  const better = families.filter((f) => !best || f.intermediates > best.intermediates || (f.intermediates === best.intermediates && f.cancelled > best.cancelled));
  const ties = best ? ranked.filter((c) => compareCandidates(c, best) === 0) : [];
  if (best && better.length === 0 && ties.length === 1) return { numbers: best.sigma.map(Number), source: 'derived', diagnostics: [] };
  const alternatives = [...new Set([...ties.map((c) => c.sigma), ...better.flatMap((f) => f.rays)].map((a) => `[${a.join(', ')}]`))];
  const listed = alternatives.slice(0, 4).join(' or ');
  return failed(
    diagnostic('route/ambiguous', 'error', `the steps allow several independent routes (${listed}); say which with times on each step`, {
      path: ['steps'],
      expected: 'times on every step',
    }),
  );
}

function compareCandidates(a: Candidate, b: Candidate): number {
  return (
    b.intermediates - a.intermediates ||
    b.cancelled - a.cancelled ||
    Number(b.plainSum) - Number(a.plainSum) ||
    a.steps - b.steps ||
    (a.size < b.size ? -1 : a.size > b.size ? 1 : 0)
  );
}

function failed(d: Diagnostic): RouteResult {
  return { source: 'none', diagnostics: [d] };
}
