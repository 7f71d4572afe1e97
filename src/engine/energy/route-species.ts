/**
 * What is present at each minimum of one turnover, from the stoichiometry alone. The walk starts
 * with everything the route needs — the reactants of the overall equation in full and the
 * catalysts — and applies each step's change in turn, so excess reactants, the catalyst carried
 * through, intermediates and finally the products all appear where they are.
 */
import type { Mechanism, Step } from '../mechanism/mechanism.ts';
import { Rational } from '../exact/rational.ts';

/** Amounts at the start of the turnover and after each step (length = steps + 1), in species order. */
export interface SpeciesWalk {
  amounts: Map<string, Rational>[];
  /** species needed at the start beyond the overall reactants and returned by the end: catalysts, chain carriers */
  carriers: string[];
}

/**
 * Walks the route. A species starts at the larger of its coefficient among the overall reactants
 * and its deepest running deficit along the route: that deficit is how much of a catalyst (or of a
 * reactant consumed twice before it is partly re-formed, as NO2 in NO2 + CO) must be on hand.
 */
export function walkSpecies(
  mechanism: Mechanism,
  sequence: readonly Step[],
  reactants: ReadonlyMap<string, Rational>,
): SpeciesWalk {
  const order = [...mechanism.species.keys()];
  const deficit = new Map<string, Rational>();
  const running = new Map<string, Rational>();
  for (const step of sequence) {
    for (const [sp, v] of step.change) {
      const now = (running.get(sp) ?? Rational.ZERO).add(v);
      running.set(sp, now);
      if (now.neg().compare(deficit.get(sp) ?? Rational.ZERO) > 0) deficit.set(sp, now.neg());
    }
  }
  const start = new Map<string, Rational>();
  const carriers: string[] = [];
  for (const sp of order) {
    const need = reactants.get(sp) ?? Rational.ZERO;
    const deepest = deficit.get(sp) ?? Rational.ZERO;
    if (deepest.compare(need) > 0 && (running.get(sp) ?? Rational.ZERO).isZero()) carriers.push(sp);
    const amount = deepest.compare(need) > 0 ? deepest : need;
    if (amount.sign() > 0) start.set(sp, amount);
  }
  const amounts = [start];
  for (const step of sequence) {
    const next = new Map(amounts[amounts.length - 1]);
    for (const [sp, v] of step.change) next.set(sp, (next.get(sp) ?? Rational.ZERO).add(v));
    amounts.push(inOrder(next, order));
  }
  return { amounts, carriers };
}

/** Drops zero amounts and lists the rest in the mechanism's species order, as plain numbers. */
export function speciesRecord(amounts: ReadonlyMap<string, Rational>): Record<string, number> {
  // fromEntries defines own properties: a species named __proto__ is kept, not swallowed by the setter.
  return Object.fromEntries([...amounts].filter(([, v]) => v.sign() > 0).map(([sp, v]) => [sp, v.toNumber()]));
}

function inOrder(amounts: Map<string, Rational>, order: readonly string[]): Map<string, Rational> {
  const out = new Map<string, Rational>();
  for (const sp of order) {
    const v = amounts.get(sp);
    if (v && !v.isZero()) out.set(sp, v);
  }
  return out;
}
