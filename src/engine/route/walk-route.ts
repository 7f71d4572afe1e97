/**
 * Which net-zero species are catalysts, and in which order the steps of the route run. Starting
 * from the overall reactants (and solvents and third bodies), steps fire whenever their reactants
 * are at hand — off-route steps too, so chain carriers made by an initiation step count as made.
 * A net-zero species never made this way has to be put in: of the blocked steps of the route, the
 * one that already has most of its reactants (a catalyst meeting its substrate) names it — a
 * declared catalyst first — and firing goes on. Everything else that cancels is an intermediate,
 * whatever order the steps are written in; the order in which route steps first fire is the order
 * of the route (a cycle starts where its catalyst is taken up).
 */
import type { Mechanism, Step } from '../mechanism/mechanism.ts';
import type { Rational } from '../exact/rational.ts';

export interface RouteWalk {
  /** the net-zero species that must be supplied for every step of the route to run */
  seeds: Set<string>;
  /** position of each step along the route (steps off the route: Infinity) */
  order: number[];
}

/** Walks the route from its starting materials. */
export function walkRoute(
  mechanism: Mechanism,
  sigma: readonly number[],
  net: ReadonlyMap<string, Rational>,
): RouteWalk {
  const available = new Set<string>();
  for (const s of mechanism.species.values()) {
    if ((net.get(s.symbol)?.sign() ?? 0) < 0 || s.solvent || s.thirdBody) available.add(s.symbol);
  }
  const route = mechanism.steps.filter((s) => (sigma[s.index] ?? 0) > 0);
  const order = mechanism.steps.map(() => Infinity);
  const seeds = new Set<string>();
  const declared = [...mechanism.species.values()].filter((s) => s.declaredRole === 'catalyst').map((s) => s.symbol);
  let position = 0;
  for (;;) {
    position = fire(mechanism, route, available, order, position);
    const blocked = route.filter((step) => order[step.index] === Infinity);
    if (blocked.length === 0) return { seeds, order };
    const seed = chooseSeed(mechanism, route, blocked, available, declared);
    seeds.add(seed);
    available.add(seed);
  }
}

/**
 * The species to supply: a declared catalyst if one is missing; otherwise the one that lets the
 * most of the route run (fewest catalysts in all), then the one taken up beside a substrate
 * already at hand (E in E + S), then record order.
 */
function chooseSeed(
  mechanism: Mechanism,
  route: Step[],
  blocked: Step[],
  available: ReadonlySet<string>,
  declared: readonly string[],
): string {
  const missing = [
    ...new Set(blocked.flatMap((step) => step.reactants.map((t) => t.species).filter((sp) => !available.has(sp)))),
  ];
  const wanted = missing.find((sp) => declared.includes(sp));
  if (wanted) return wanted;
  const ready = (step: Step) => step.reactants.filter((t) => available.has(t.species)).length;
  const score = (sp: string) => {
    const trial = new Set([...available, sp]);
    const order = mechanism.steps.map(() => Infinity);
    fire(mechanism, route, trial, order, 0);
    const runs = route.filter((step) => order[step.index] !== Infinity).length;
    const takenUp = Math.max(...blocked.filter((step) => step.reactants.some((t) => t.species === sp)).map(ready));
    return { runs, takenUp, first: blocked.findIndex((step) => step.reactants.some((t) => t.species === sp)) };
  };
  const scored = missing.map((sp) => ({ sp, ...score(sp) }));
  scored.sort((a, b) => b.runs - a.runs || b.takenUp - a.takenUp || a.first - b.first);
  return scored[0]!.sp;
}

/** Fires steps until nothing new becomes available; route steps get their positions as they first fire. */
function fire(mechanism: Mechanism, route: Step[], available: Set<string>, order: number[], position: number): number {
  for (let grew = true; grew;) {
    grew = false;
    for (const step of route) {
      if (order[step.index] !== Infinity || !step.reactants.every((t) => available.has(t.species))) continue;
      order[step.index] = position++;
      grew = true;
      for (const t of step.products) available.add(t.species);
    }
    for (const step of mechanism.steps) {
      const sides = step.reversible
        ? [
            [step.reactants, step.products],
            [step.products, step.reactants],
          ]
        : [[step.reactants, step.products]];
      for (const [from, to] of sides) {
        if (!from!.every((t) => available.has(t.species))) continue;
        for (const t of to!) {
          if (!available.has(t.species)) {
            available.add(t.species);
            grew = true;
          }
        }
      }
    }
  }
  return position;
}
