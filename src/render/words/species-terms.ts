/** Species amounts as the terms of an equation side. */

/** Terms of a species list, `2 H2O2`, `I-`, in the order given. */
export function speciesTerms(species: Readonly<Record<string, number>>): string[] {
  return Object.entries(species).map(([sp, n]) => (n === 1 ? sp : `${+n.toPrecision(6)} ${sp}`));
}
