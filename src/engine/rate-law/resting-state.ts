/**
 * The resting state of a catalyst at given conditions: the form that holds the largest share of
 * its total (the dominant term of the saturation denominator).
 */
import type { CatalystBalance } from './rate-law.ts';

export interface RestingState {
  catalyst: string;
  species: string;
  /** its share of the catalyst's total, 0–1 */
  fraction: number;
}

/** The dominant form of each conserved catalyst, where every symbol has a value. */
export function restingStates(
  balances: readonly CatalystBalance[],
  values: ReadonlyMap<string, number>,
): RestingState[] {
  const out: RestingState[] = [];
  for (const balance of balances) {
    const shares = balance.forms.map((f) => ({
      species: f.species,
      share: f.fraction.symbols().every((s) => values.has(s)) ? f.fraction.evaluate(values) : Number.NaN,
    }));
    if (shares.some((s) => !Number.isFinite(s.share))) continue;
    const top = shares.reduce((a, b) => (b.share > a.share ? b : a));
    out.push({ catalyst: balance.catalyst, species: top.species, fraction: Math.round(top.share * 1e4) / 1e4 });
  }
  return out;
}
