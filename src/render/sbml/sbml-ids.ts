/** SBML identifiers for species symbols (`I-` → `s_I_minus`), unique within a model. */

const WORDS: Record<string, string> = {
  '+': '_plus',
  '-': '_minus',
  '*': '_excited',
  '•': '_radical',
  '.': '_dot',
  '·': '_dot',
  '^': '',
  '[': '_',
  ']': '_',
  '(': '_',
  ')': '_',
};

/** A valid, unique SId per symbol, readable where the symbol allows. */
export function sbmlIds(symbols: readonly string[]): Map<string, string> {
  const bases = symbols.map((symbol) => {
    const base = `s_${[...symbol].map((c) => (/[A-Za-z0-9_]/.test(c) ? c : (WORDS[c] ?? '_'))).join('')}`
      .replace(/_+/g, '_')
      .replace(/_$/, '');
    return base === 's' ? 's_species' : base;
  });
  const ids = uniqueIds(bases);
  return new Map(symbols.map((symbol, i) => [symbol, ids[i]!]));
}

/** The ids as given, with `_2`, `_3`… added where one repeats an earlier one, so every id is used once. */
export function uniqueIds(candidates: readonly string[]): string[] {
  const used = new Set<string>();
  return candidates.map((base) => {
    let id = base;
    for (let n = 2; used.has(id); n++) id = `${base}_${n}`;
    used.add(id);
    return id;
  });
}
