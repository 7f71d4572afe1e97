/**
 * The catalogue, species, system and checks pages of the demo site, built once with the
 * `mechatlas build` command into a temporary folder.
 */
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { loadCatalogue, type Catalogue } from '../../src/site/index.ts';

let out = '';
let catalogue: Catalogue;

beforeAll(async () => {
  // The demo site is built once for the whole run by tests/global-site-builds.ts.
  out = inject('demoSite');
  catalogue = await loadCatalogue('content/mechanisms');
}, 60_000);

/** A built page's HTML, without Astro's scoped-style attributes. */
const page = async (path: string) =>
  (await readFile(join(out, path, 'index.html'), 'utf8')).replace(/ data-astro-cid-[\w-]+/g, '');

/** The opening tag of the first element carrying `attribute="value"`, and the text up to the next such row. */
function rowOf(html: string, attribute: string, value: string): string {
  const start = html.indexOf(`${attribute}="${value}"`);
  expect(start, `${attribute}="${value}"`).toBeGreaterThan(-1);
  const end = html.indexOf('</tr>', start);
  return html.slice(html.lastIndexOf('<', start), end < 0 ? undefined : end);
}

describe('the demo site pages', () => {
  it('builds home, the species index and pages, the systems index and pages, and checks', () => {
    const expected = [
      '',
      'species',
      'systems',
      'checks',
      ...catalogue.species.map((s) => `s/${s.slug}`),
      ...catalogue.systems.map((s) => `systems/${s.system}`),
    ];
    expect(catalogue.species.length).toBeGreaterThan(30);
    expect(catalogue.systems.map((s) => s.system)).toContain('kx7-hydroarylation');
    const missing = expected.filter((p) => !existsSync(join(out, p, 'index.html')));
    expect(missing).toEqual([]);
  });

  it('home: the search slot, systems with counts of rivals and survivors, open problems and recent records', async () => {
    const html = await page('');
    expect(html).toMatch(/<form class="search" role="search" action="\/search\/" method="get"/);
    expect(html).toMatch(/<input[^>]*type="search"[^>]*name="q"[^>]*id="home-search"/);
    const kx7 = html.slice(html.indexOf('data-system="kx7-hydroarylation"'));
    // The withdrawn ternary adduct fits the orders but is not a live rival: one of one survives.
    expect(kx7).toMatch(/<strong>3<\/strong> rival mechanisms:\s*the one live rival survives/);
    expect(html).toContain('href="/checks/"');
    expect(rowOf(html, 'data-observation', 'kx7-saturation-2026-02')).toContain('kx7-hydroarylation-arene-first');
    // Approximation warnings, where the engine reports any, link to their lines.
    for (const r of catalogue.records) {
      for (const d of r.report.diagnostics.filter((x) => x.rule.startsWith('approximation/')))
        expect(html).toContain(`href="/m/${r.id}/#L${d.line}"`);
    }
    // The five newest records, newest first.
    const recent = html.slice(html.indexOf('id="recent-heading"'));
    const order = [
      'isomerase-mimic-product-complex',
      'isomerase-mimic-single-complex',
      'fluoroform-chlorination-cf3-termination',
    ].map((id) => recent.indexOf(`/m/${id}/`));
    expect(order.every((i) => i > 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
  });

  it('the kx7 system page shows the rival its observations contradict as not surviving', async () => {
    const html = await page('systems/kx7-hydroarylation');
    expect(rowOf(html, 'data-rival', 'kx7-hydroarylation-arene-first')).toContain('data-survives="false"');
    expect(rowOf(html, 'data-rival', 'kx7-hydroarylation-arene-first')).toContain('does not survive');
    expect(rowOf(html, 'data-rival', 'kx7-hydroarylation-alkene-first')).toContain('data-survives="true"');
    // The matrix: arene-first fails the saturation observation, in words, not by colour alone.
    const saturation = rowOf(html, 'data-observation', 'kx7-saturation-2026-02');
    expect(saturation).toMatch(
      /data-rival="kx7-hydroarylation-arene-first" data-status="fail">\s*<span class="fail"><span aria-hidden="true">✗<\/span> contradicted/,
    );
    // Rival overall equations are the same change, written in another order: not flagged.
    expect(html).not.toContain('data-overall-differs');
    // The measurement that would tell the survivors apart.
    // The only live survivor has no live rival left to tell it from: no measurement is suggested
    // against the withdrawn adduct, which is listed apart with its reason.
    expect(html).not.toContain('Measure the order in');
    expect(rowOf(html, 'data-rival', 'kx7-hydroarylation-ternary-adduct')).toContain('data-contention="set_apart"');
    expect(rowOf(html, 'data-rival', 'kx7-hydroarylation-ternary-adduct')).toContain('ligand impurity');
    expect(html).toContain('class="katex"');
  });

  it('a species page lists the role in every mechanism (Cat is the catalyst in the kx7 system)', async () => {
    // Cat is a label (notation: labels): its page belongs to its system.
    const slug = catalogue.species.find((s) => s.symbol === 'Cat' && s.system === 'kx7-hydroarylation')!.slug;
    expect(slug).toBe('kx7-hydroarylation/cat');
    const html = await page(`s/${slug}`);
    for (const id of [
      'kx7-hydroarylation-alkene-first',
      'kx7-hydroarylation-arene-first',
      'kx7-hydroarylation-ternary-adduct',
    ]) {
      expect(rowOf(html, 'data-mechanism', id)).toContain('data-role="catalyst"');
      expect(rowOf(html, 'data-mechanism', id)).toMatch(/class="role"[^>]*>catalyst/);
    }
    expect(html).toContain('catalyst in 3');
    expect(html).toContain('KX-7 pincer catalyst (resting form)');
  });

  it('the species index shows each species with its symbol in KaTeX and its roles', async () => {
    const html = await page('species');
    expect(rowOf(html, 'data-slug', catalogue.slugs['H3O+']!)).toContain('catalyst in 2, buffered in 2');
    expect(html.match(/<tr data-slug=/g)?.length).toBe(catalogue.species.length);
  });

  it('the checks page lists the observation/order warnings with links to their lines', async () => {
    const html = await page('checks');
    const section = html.slice(html.indexOf('id="warning-observation-order"'));
    expect(section.length).toBeLessThan(html.length);
    for (const line of [27, 32]) expect(section).toContain(`href="/m/kx7-hydroarylation-arene-first/#L${line}"`);
    expect(section).toContain('content/mechanisms/kx7-hydroarylation-arene-first.yaml:27:18');
    expect(html).toContain('href="#warning-observation-order"');
    const warnings = catalogue.records.reduce(
      (n, r) => n + r.report.diagnostics.filter((d) => d.severity === 'warning').length,
      0,
    );
    expect(warnings).toBeGreaterThanOrEqual(3);
    expect(html).toContain(`href="#warning">${warnings} warnings</a>`);
    // One small bundled script (the filters); the page lists everything without it.
    expect(html.match(/<script/g)).toHaveLength(1);
    expect(html).toMatch(/<script type="module" src="\/_astro\/[^"]+\.js"><\/script>/);
    expect(html).toContain('<form id="checks-filter" class="filters" hidden');
  });

  it('an enzyme law is shown normalised and in the trade constants, each with its value and unit', async () => {
    const html = await page('m/isomerase-mimic-single-complex');
    expect(html).toContain('Normalised: each sum below the line starts from 1');
    expect(html).toContain("In the trade's constants (Michaelis–Menten with competitive inhibition)");
    // From the record's constants, computed here: K_M = (k_-1 + k_2)/k_1 = (40 + 10)/2.0e5 M,
    // K_i = k_-inh/k_inh = 5.0/1.0e6 M, k_cat = k_2 = 10 s^-1.
    expect(rowOf(html, 'data-constant', 'K_M')).toContain('2.5 × 10⁻⁴');
    expect(rowOf(html, 'data-constant', 'K_i')).toContain('5 × 10⁻⁶');
    expect(rowOf(html, 'data-constant', 'k_cat')).toMatch(/<td class="num"> 10 /);
    expect(rowOf(html, 'data-constant', 'K_M')).toContain('Michaelis constant');
    // V_max depends on the enzyme's concentration: its unit, and no value.
    expect(rowOf(html, 'data-constant', 'V_max')).toContain('no value');
  });

  it('pages set the case of species symbols as written (no uppercase on symbol cells)', async () => {
    const html = await page('species');
    expect(html).toContain('data-symbol="Ald"');
  });
});
