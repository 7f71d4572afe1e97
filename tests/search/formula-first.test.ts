/**
 * A query that reads as a formula lists species first and keeps mechanisms matched only through
 * their words (title, tags, system) apart; formulas are split for display with subscripts.
 */
import { describe, expect, it } from 'vitest';
import { buildSearchIndex } from '../../src/search/build-index.ts';
import { formulaParts } from '../../src/search/formula-parts.ts';
import { createCatalogueSearch } from '../../src/search/search-catalogue.ts';

const chlorination = {
  id: 'chlorination',
  title: 'Chlorination of fluoroform',
  tags: [],
  species: [
    { symbol: 'Cl2', name: 'chlorine', role: 'reactant', aliases: [] },
    { symbol: 'HCl', name: 'hydrogen chloride', role: 'product', aliases: [] },
  ],
};
const tagged = {
  id: 'tagged',
  title: 'An isomerisation',
  tags: ['Cl-free', 'enzyme'],
  species: [{ symbol: 'S', name: 'substrate', role: 'reactant', aliases: [] }],
};
const species = [
  {
    symbol: 'Cl2',
    slug: 'cl2',
    names: ['chlorine'],
    aliases: [],
    occurrences: [{ mechanism: 'chlorination', title: 't' }],
  },
  {
    symbol: 'HCl',
    slug: 'hcl',
    names: ['hydrogen chloride'],
    aliases: [],
    occurrences: [{ mechanism: 'chlorination', title: 't' }],
  },
  {
    symbol: 'S',
    slug: 'tagged/s',
    system: 'iso',
    names: ['substrate'],
    aliases: [],
    occurrences: [{ mechanism: 'tagged', title: 't' }],
  },
];
const search = createCatalogueSearch(JSON.parse(JSON.stringify(buildSearchIndex([chlorination, tagged], species))));

describe('formula queries', () => {
  it('reads Cl as a formula: species by formula, mechanisms through a species, tag-only matches apart', () => {
    const outcome = search('Cl');
    expect(outcome.formulaLike).toBe(true);
    expect(
      outcome.species
        .map((s) => s.doc.symbol)
        .slice(0, 2)
        .sort(),
    ).toEqual(['Cl2', 'HCl']);
    expect(outcome.mechanisms.find((m) => m.doc.id === 'chlorination')?.through).toBe('species');
    const loose = outcome.mechanisms.find((m) => m.doc.id === 'tagged');
    if (loose) expect(loose.through).toBe('words');
  });

  it('does not read a word as a formula', () => {
    expect(search('chlorine').formulaLike).toBe(false);
  });

  it('links a label to its own system page', () => {
    const doc = search('substrate').species[0]!.doc;
    expect(doc.path).toBe('s/tagged/s/');
    expect(doc.system).toBe('iso');
  });
});

describe('formula parts', () => {
  const show = (symbol: string) =>
    formulaParts(symbol)
      .map((p) => (p.kind === 'text' ? p.text : `${p.kind}(${p.text})`))
      .join('');
  it('writes counts as subscripts and charges as superscripts, as the pages do', () => {
    expect(show('CHF3')).toBe('CHFsub(3)');
    expect(show('H3O+')).toBe('Hsub(3)Osup(+)');
    expect(show('SO4^2-')).toBe('SOsub(4)sup(2\u2212)');
    expect(show('Fe3+')).toBe('Fesup(3+)');
    expect(show('NH4+')).toBe('NHsub(4)sup(+)');
    expect(show('CH3CH(OCH3)2')).toBe('CHsub(3)CH(OCHsub(3))sub(2)');
    expect(show('Cl•')).toBe('Clsup(•)');
    expect(show('ES')).toBe('ES');
  });
});
