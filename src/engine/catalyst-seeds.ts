/**
 * Which net-zero species are catalysts: those that must be present at the start for the route
 * to run. Starting from the overall reactants (and solvents, buffered species, third bodies),
 * steps fire whenever their reactants are at hand — off-route steps too, so chain carriers made
 * by an initiation step count as made. A net-zero species never made this way has to be put in:
 * the first one a blocked step of the route needs (declared catalysts first, then record order)
 * is taken as a catalyst, and firing goes on. Everything else that cancels is an intermediate,
 * whatever order the steps are written in.
 */
import type { Mechanism } from './mechanism.ts';
import type { Rational } from './rational.ts';

/** The net-zero species that must be supplied for every step of the route to run. */
export function catalystSeeds(mechanism: Mechanism, sigma: readonly number[], net: ReadonlyMap<string, Rational>): Set<string> {
  const available = new Set<string>();
  for (const s of mechanism.species.values()) {
    if ((net.get(s.symbol)?.sign() ?? 0) < 0 || s.solvent || s.thirdBody) available.add(s.symbol);
  }
  const seeds = new Set<string>();
  const route = mechanism.steps.filter((s) => (sigma[s.index] ?? 0) > 0);
  const declared = [...mechanism.species.values()].filter((s) => s.declaredRole === 'catalyst').map((s) => s.symbol);
  for (;;) {
    fire(mechanism, available);
    const blocked = route.find((step) => step.reactants.some((t) => !available.has(t.species)));
    if (!blocked) return seeds;
    const missing = blocked.reactants.map((t) => t.species).filter((sp) => !available.has(sp));
    const seed = missing.find((sp) => declared.includes(sp)) ?? missing[0]!;
    seeds.add(seed);
    available.add(seed);
  }
}

/** Fires steps (forward, and reversible ones backward) until nothing new becomes available. */
function fire(mechanism: Mechanism, available: Set<string>): void {
  for (let grew = true; grew; ) {
    grew = false;
    for (const step of mechanism.steps) {
      const sides = step.reversible ? [[step.reactants, step.products], [step.products, step.reactants]] : [[step.reactants, step.products]];
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
}
