/**
 * Species pages: a label (notation: labels) belongs to its reaction system, so two systems that
 * both write A get two pages; a formula is one substance and one page across the catalogue.
 * Also the plain-text notes of steps, and the rivals set apart from the contest.
 */
import { describe, expect, it } from 'vitest';
import { speciesPages, speciesPageSlugs, recordSpeciesSlugs } from '../../src/site/species-pages.ts';
import { plainNoteHtml, systemView, type RecordView } from '../../src/site/index.ts';

function record(id: string, system: string, notation: 'labels' | 'formulas', symbols: [string, string?][]): RecordView {
  return {
    id,
    system,
    notation,
    title: id,
    speciesSlugs: {},
    species: symbols.map(([symbol, name]) => ({ symbol, buffered: false, aliases: [], ...(name && { name }) })),
    report: { id, file: `${id}.yaml`, diagnostics: [] },
    errors: 0,
  } as unknown as RecordView;
}

describe('species pages per system', () => {
  const records = [
    record('kx-a', 'kx', 'labels', [
      ['A', 'alkene'],
      ['Cat', 'pincer catalyst'],
    ]),
    record('kx-b', 'kx', 'labels', [['A', 'alkene'], ['Cat']]),
    record('enz-a', 'enzyme', 'labels', [
      ['A', 'NADH'],
      ['E', 'enzyme'],
    ]),
    record('gas-a', 'chlorination', 'formulas', [['Cl2'], ['HCl']]),
    record('gas-b', 'bromination', 'formulas', [['HCl'], ['Br2']]),
  ];
  const slugs = speciesPageSlugs(records);
  const pages = speciesPages(records, slugs);

  it('gives A one page in each system that uses it, never a shared one', () => {
    const a = pages.filter((p) => p.symbol === 'A');
    expect(a.map((p) => [p.slug, p.system, p.names])).toEqual([
      ['enzyme/a', 'enzyme', ['NADH']],
      ['kx/a', 'kx', ['alkene']],
    ]);
    expect(a.find((p) => p.system === 'kx')!.occurrences.map((o) => o.mechanism)).toEqual(['kx-a', 'kx-b']);
  });

  it('shares a formula across systems', () => {
    const hcl = pages.filter((p) => p.symbol === 'HCl');
    expect(hcl).toHaveLength(1);
    expect(hcl[0]!.slug).toBe('hcl');
    expect(hcl[0]!.system).toBeUndefined();
    expect(hcl[0]!.occurrences.map((o) => o.mechanism)).toEqual(['gas-a', 'gas-b']);
  });

  it('links each record to its own species pages', () => {
    expect(recordSpeciesSlugs(records[2]!, slugs)).toEqual({ A: 'enzyme/a', E: 'enzyme/e' });
    expect(recordSpeciesSlugs(records[3]!, slugs)).toEqual({ Cl2: 'cl2', HCl: 'hcl' });
  });
});

describe('rivals set apart', () => {
  const rival = (id: string, status: string, statusReason?: string) =>
    ({
      ...record(id, 's', 'labels', [['A']]),
      status,
      ...(statusReason && { statusReason }),
      report: {
        id,
        file: `${id}.yaml`,
        diagnostics: [],
        rate_laws: [{ method: 'rds', orders: { A: { low: id === 'live-2' ? 0 : 1, high: 1 } }, derivation: [] }],
        observations: [],
      },
    }) as unknown as RecordView;

  it('lists withdrawn rivals and disfavoured ones with a reason apart, and suggests measurements only among live ones', () => {
    const v = systemView('s', [
      rival('live-1', 'favoured'),
      rival('live-2', 'proposed'),
      rival('gone', 'withdrawn', 'the signal was an impurity'),
      rival('doubted', 'disfavoured', 'activation volume'),
      rival('doubted-silently', 'disfavoured'),
    ]);
    expect(v.rivals.map((r) => [r.id, r.contention])).toEqual([
      ['live-1', 'live'],
      ['live-2', 'live'],
      ['gone', 'set_apart'],
      ['doubted', 'set_apart'],
      ['doubted-silently', 'live'],
    ]);
    expect(v.rivals.find((r) => r.id === 'gone')!.statusReason).toBe('the signal was an impurity');
    for (const d of v.discriminators) {
      expect(['gone', 'doubted']).not.toContain(d.a);
      expect(['gone', 'doubted']).not.toContain(d.b);
    }
    expect(v.discriminators.map((d) => [d.a, d.b, d.species])).toContainEqual(['live-1', 'live-2', 'A']);
  });
});

describe('plain-text notes', () => {
  it('typesets rate constants, e-notation and unit powers, and escapes the rest', () => {
    const html = plainNoteHtml('fast loss (k_-1 = 4.0e6 M^-1 s^-1) <b>&');
    expect(html).toContain('class="katex"');
    expect(html).toContain('4.0 × 10⁶ M⁻¹ s⁻¹');
    expect(html).toContain('&lt;b&gt;&amp;');
    expect(html).not.toContain('k_-1');
    expect(html).not.toContain('<b>');
  });

  it('reads a named reverse constant as one subscript', () => {
    expect(plainNoteHtml('k_-bind ≈ 7.2e3 s^-1')).toMatch(/bind[\s\S]*≈ 7\.2 × 10³ s⁻¹/);
  });
});
