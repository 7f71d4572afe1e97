// The catalogue search without a browser: the prebuilt bundle, its JSON round trip, ranking,
// case-sensitive formulas, filters and the announced summary.
import { describe, expect, it } from 'vitest';
import { loadCatalogue } from '../../src/site/index.ts';
import { buildSearchIndex, type MechanismInput, type SpeciesInput } from '../../src/search/build-index.ts';
import { outcomeSummary } from '../../src/search/outcome-summary.ts';
import { createCatalogueSearch, isLiteralQuery, type SearchOutcome } from '../../src/search/search-catalogue.ts';
import { FORMULA_KEYS, TEXT_KEYS, type SearchBundle } from '../../src/search/search-doc.ts';

const carbonyl: MechanismInput = {
  id: 'cobalt-carbonyl',
  title: 'Carbonyl binding at a cobalt centre',
  system: 'cobalt-carbonyl-formation',
  status: 'favoured',
  tags: ['organometallic'],
  species: [
    { symbol: 'Co', name: 'cobalt centre', role: 'reactant', aliases: [] },
    { symbol: 'CO', name: 'carbon monoxide', role: 'reactant', aliases: ['carbonic oxide'] },
    { symbol: 'CoCO', name: 'cobalt carbonyl', role: 'product', aliases: [] },
  ],
};
const oxidation: MechanismInput = {
  id: 'monoxide-oxidation',
  title: 'Oxidation of the monoxide by atomic oxygen',
  system: 'monoxide-oxidation',
  status: 'proposed',
  tags: ['gas-phase'],
  species: [
    { symbol: 'CO', name: 'carbon monoxide', role: 'reactant', aliases: ['carbonic oxide'] },
    { symbol: 'O', name: 'oxygen atom', role: 'reactant', aliases: [] },
    { symbol: 'CO2', name: 'carbon dioxide', role: 'product', aliases: [] },
  ],
};
const labelled: MechanismInput = {
  id: 'labelled-cycle',
  title: 'A labelled catalytic cycle',
  status: 'withdrawn',
  tags: [],
  species: [
    { symbol: 'E', name: 'free catalyst', role: 'catalyst', aliases: ['IM-9'] },
    { symbol: 'S', name: 'substrate', role: 'reactant', aliases: [] },
    { symbol: 'ES', name: 'substrate complex', role: 'intermediate', aliases: [] },
    { symbol: 'Z2', name: 'chloride dimer', formula: 'C2H6Cl2Zn2', role: 'inhibitor', aliases: [] },
  ],
};
const mechanisms = [carbonyl, oxidation, labelled];

/** Species pages as the catalogue builds them: one per symbol, with every occurrence. */
function speciesOf(list: MechanismInput[]): SpeciesInput[] {
  const bySymbol = new Map<
    string,
    SpeciesInput & { occurrences: { mechanism: string; title: string; role?: string }[] }
  >();
  for (const m of list) {
    for (const s of m.species) {
      const page = bySymbol.get(s.symbol) ?? {
        symbol: s.symbol,
        slug: s.symbol.toLowerCase() + (s.symbol === 'CO' ? '-x' : ''),
        names: s.name ? [s.name] : [],
        aliases: [...s.aliases],
        occurrences: [],
      };
      if (s.formula) page.formula = s.formula;
      page.occurrences.push({ mechanism: m.id, title: m.title, ...(s.role && { role: s.role }) });
      bySymbol.set(s.symbol, page);
    }
  }
  return [...bySymbol.values()];
}

/** The bundle as the browser receives it: through JSON. */
function bundleOf(list: MechanismInput[]): SearchBundle {
  return JSON.parse(JSON.stringify(buildSearchIndex(list, speciesOf(list)))) as SearchBundle;
}

const search = createCatalogueSearch(bundleOf(mechanisms));
const symbolsOf = (o: SearchOutcome) => o.species.map((s) => s.doc.symbol);
const hitSymbols = (o: SearchOutcome, id: string) => {
  const r = o.mechanisms.find((m) => m.doc.id === id);
  return r ? r.hits.map((h) => r.doc.species[h.index]!.symbol) : undefined;
};

describe('buildSearchIndex', () => {
  it('makes one document per mechanism, then one per species, with both indexes over them', () => {
    const bundle = buildSearchIndex(mechanisms, speciesOf(mechanisms));
    expect(bundle.docs.map((d) => `${d.kind}:${d.id}`)).toEqual([
      'mechanism:cobalt-carbonyl',
      'mechanism:monoxide-oxidation',
      'mechanism:labelled-cycle',
      'species:co',
      'species:co-x',
      'species:coco',
      'species:o',
      'species:co2',
      'species:e',
      'species:s',
      'species:es',
      'species:z2',
    ]);
    const text = bundle.textIndex as { keys: { path: string[] }[]; records: unknown[] };
    const formula = bundle.formulaIndex as { keys: { path: string[] }[]; records: unknown[] };
    expect(text.keys.map((k) => k.path.join('.'))).toEqual(TEXT_KEYS.map((k) => k.name));
    expect(formula.keys.map((k) => k.path.join('.'))).toEqual(FORMULA_KEYS.map((k) => k.name));
    expect(text.records).toHaveLength(bundle.docs.length);
    expect(JSON.stringify(buildSearchIndex(mechanisms, speciesOf(mechanisms)))).toBe(JSON.stringify(bundle));
  });

  it('keeps the species-aligned fields aligned, blank where a value is missing', () => {
    const doc = buildSearchIndex([labelled], speciesOf([labelled])).docs[0]!;
    expect(doc.symbols).toEqual(['E', 'S', 'ES', 'Z2']);
    expect(doc.formulas).toEqual(['', '', '', 'C2H6Cl2Zn2']);
    expect(doc.roles).toEqual(['catalyst', 'reactant', 'intermediate', 'inhibitor']);
    expect(doc.names).toEqual(['free catalyst', 'IM-9', 'substrate', 'substrate complex', 'chloride dimer']);
    expect(doc.nameOwner).toEqual([0, 0, 1, 2, 3]);
    expect(doc.nameKind).toEqual(['name', 'alias', 'name', 'name', 'name']);
  });
});

describe('isLiteralQuery', () => {
  it.each([
    ['CO', true],
    ['HCl', true],
    ['Cl2', true],
    ['Fe3+', true],
    ['KX-7', true],
    ['A', true],
    ['Co', false],
    ['Cat', false],
    ['Fluoroform', false],
    ['co', false],
    ['kx-7', false],
    ['carbon monoxide', false],
    ['CO + O', false],
  ])('%s → %s', (query, expected) => expect(isLiteralQuery(query)).toBe(expected));
});

describe('the catalogue search', () => {
  it('matches formulas with case: CO is carbon monoxide, never cobalt', () => {
    const outcome = search('CO');
    expect(outcome.literal).toBe(true);
    expect(symbolsOf(outcome)).toEqual(['CO', 'CO2', 'CoCO']);
    expect(hitSymbols(outcome, 'cobalt-carbonyl')).toEqual(['CO', 'CoCO']);
    expect(hitSymbols(outcome, 'monoxide-oxidation')).toEqual(['CO', 'CO2']);
    expect(outcome.mechanisms.every((m) => m.hits.every((h) => m.doc.species[h.index]!.symbol !== 'Co'))).toBe(true);
  });

  it('Co finds cobalt first and never carbon monoxide by its formula', () => {
    const outcome = search('Co');
    expect(symbolsOf(outcome)[0]).toBe('Co');
    expect(symbolsOf(outcome)).not.toContain('CO');
    expect(symbolsOf(outcome)).not.toContain('CO2');
    expect(hitSymbols(outcome, 'cobalt-carbonyl')?.[0]).toBe('Co');
    // A capitalised word also matches names loosely (substrate complex), but the mechanism
    // that has carbon monoxide and no cobalt is not found through CO.
    expect(outcome.mechanisms[0]!.doc.id).toBe('cobalt-carbonyl');
    expect(outcome.mechanisms.map((m) => m.doc.id)).not.toContain('monoxide-oxidation');
  });

  it('ranks an exact formula above a formula that contains it, and both above names', () => {
    const outcome = search('CO2');
    expect(symbolsOf(outcome)).toEqual(['CO2']);
    expect(outcome.mechanisms[0]!.score).toBe(0);
    const part = search('Cl2');
    expect(part.species[0]!.doc.symbol).toBe('Z2');
    expect(part.species[0]!.how).toBe('formula');
    expect(part.species[0]!.score).toBeGreaterThan(1);
    expect(part.species[0]!.score).toBeLessThan(2);
  });

  it('matches names, aliases and small typos loosely, and says which species matched', () => {
    const byName = search('carbon monoxide');
    expect(byName.literal).toBe(false);
    expect(symbolsOf(byName)[0]).toBe('CO');
    expect(byName.mechanisms.map((m) => m.doc.id).sort()).toEqual(['cobalt-carbonyl', 'monoxide-oxidation']);
    expect(byName.mechanisms[0]!.hits[0]).toMatchObject({ how: 'name', term: 'carbon monoxide' });
    const byAlias = search('Carbonic Oxide');
    expect(byAlias.mechanisms[0]!.hits[0]).toMatchObject({ how: 'alias', term: 'carbonic oxide' });
    const typo = search('carbon monoxyde');
    expect(symbolsOf(typo)[0]).toBe('CO');
    expect(typo.species[0]!.score).toBeGreaterThanOrEqual(4);
  });

  it('takes a literal code such as an alias with capitals as written', () => {
    expect(search('IM-9').mechanisms.map((m) => m.doc.id)).toEqual(['labelled-cycle']);
    expect(search('im-9').mechanisms.map((m) => m.doc.id)).toEqual(['labelled-cycle']);
    expect(search('IM-8').mechanisms).toEqual([]);
  });

  it('filters by role: only species with that role are shown, and results without one are dropped', () => {
    const outcome = search('CO', { role: 'product' });
    expect(hitSymbols(outcome, 'cobalt-carbonyl')).toEqual(['CoCO']);
    expect(hitSymbols(outcome, 'monoxide-oxidation')).toEqual(['CO2']);
    expect(symbolsOf(outcome)).toEqual(['CO2', 'CoCO']);
    // Matched by title only: the mechanism stays, showing its species with the role.
    const byTitle = search('oxidation', { role: 'product' });
    expect(hitSymbols(byTitle, 'monoxide-oxidation')).toEqual(['CO2']);
  });

  it('filters by status, narrowing species to their occurrences in such mechanisms', () => {
    const outcome = search('carbon monoxide', { status: 'proposed' });
    expect(outcome.mechanisms.map((m) => m.doc.id)).toEqual(['monoxide-oxidation']);
    expect(outcome.species[0]!.occurrences.map((o) => o.mechanism)).toEqual(['monoxide-oxidation']);
  });

  it('with filters and no query, lists everything that passes them', () => {
    const outcome = search('', { role: 'inhibitor' });
    expect(outcome.browsing).toBe(true);
    expect(outcome.mechanisms.map((m) => m.doc.id)).toEqual(['labelled-cycle']);
    expect(symbolsOf(outcome)).toEqual(['Z2']);
    expect(search('').mechanisms).toEqual([]);
  });

  it('suggests the formula when the only difference is case', () => {
    const outcome = search('CL2');
    expect(outcome.mechanisms).toEqual([]);
    expect(search('CO2X').didYouMean).toEqual([]);
    expect(search('COCO').didYouMean).toEqual(['CoCO']);
  });
});

describe('outcomeSummary', () => {
  it('counts, names the filters, and hints at case when nothing matched', () => {
    expect(outcomeSummary(search('CO'))).toBe('2 mechanisms and 3 species match “CO”.');
    expect(outcomeSummary(search('CO', { role: 'product', status: 'proposed' }))).toBe(
      '1 mechanism and 1 species match “CO” (role product, status proposed).',
    );
    expect(outcomeSummary(search('COCO'))).toBe('Nothing matches “COCO”. Formulas match with case: try CoCO.');
    expect(outcomeSummary(search('', { role: 'third_body' }))).toBe('0 mechanisms and 0 species (role third body).');
    expect(outcomeSummary(search(''))).toBe('Type a species name, formula, symbol, title or tag.');
  });
});

describe('the demo catalogue', () => {
  it('finds every mechanism by the name and by the symbol of each of its species', async () => {
    const catalogue = await loadCatalogue();
    const demo = createCatalogueSearch(
      JSON.parse(JSON.stringify(buildSearchIndex(catalogue.records, catalogue.species))) as SearchBundle,
    );
    const missed: string[] = [];
    for (const record of catalogue.records) {
      for (const s of record.species) {
        for (const query of [s.symbol, ...(s.name ? [s.name] : [])]) {
          const hit = demo(query)
            .mechanisms.find((m) => m.doc.id === record.id)
            ?.hits.find((h) => record.species[h.index]?.symbol === s.symbol);
          if (!hit) missed.push(`${record.id}: ${query}`);
        }
      }
    }
    expect(missed).toEqual([]);
  }, 60_000);
});
