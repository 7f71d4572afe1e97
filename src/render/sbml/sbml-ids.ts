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
  const out = new Map<string, string>();
  const used = new Set<string>();
  for (const symbol of symbols) {
    let base = `s_${[...symbol].map((c) => (/[A-Za-z0-9_]/.test(c) ? c : (WORDS[c] ?? '_'))).join('')}`
      .replace(/_+/g, '_')
      .replace(/_$/, '');
    if (base === 's') base = 's_species';
    let id = base;
    for (let n = 2; used.has(id); n++) id = `${base}_${n}`;
    used.add(id);
    out.set(symbol, id);
  }
  return out;
}
