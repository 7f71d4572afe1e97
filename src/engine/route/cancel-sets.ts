/**
 * Within one set of steps, the sets of species that may cancel, best first, for the route search
 * to try in turn: the most species, then the most formed before they are consumed.
 */
import type { Rational } from '../exact/rational.ts';
import type { SearchBudget } from './search-budget.ts';

/**
 * Subsets of the species that may cancel, best first: most species, then most of the
 * intermediate pattern. Generated lazily, because the first feasible set is almost always the
 * full one; a level larger than the budget left is not even listed.
 */
export function* cancelSets(
  choosable: string[],
  forced: string[],
  firstSign: (sp: string) => number,
  budget: SearchBudget,
): Generator<{ species: string[]; intermediates: number }> {
  const forcedIntermediates = forced.filter((sp) => firstSign(sp) > 0).length;
  for (let drop = 0; drop <= choosable.length; drop++) {
    const sets: { species: string[]; intermediates: number }[] = [];
    for (const kept of combinationsOf(choosable, choosable.length - drop)) {
      if (sets.length >= budget.remaining) {
        budget.take(budget.remaining + 1);
        return;
      }
      sets.push({
        species: [...forced, ...kept],
        intermediates: forcedIntermediates + kept.filter((sp) => firstSign(sp) > 0).length,
      });
    }
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
export function firstChangeSign(
  steps: readonly { change: ReadonlyMap<string, Rational> }[],
  stepIndices: number[],
  sp: string,
): number {
  for (const i of stepIndices) {
    const v = steps[i]!.change.get(sp);
    if (v && !v.isZero()) return v.sign();
  }
  return 0;
}
