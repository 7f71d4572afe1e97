/**
 * The real Astro build, run once for this file on the demo catalogue plus two records made to
 * attack the pages (hostile text everywhere; a record with errors and no derivation), then the
 * built files are read: every demo page, KaTeX, the JSON API, no assets from the network, the
 * YAML downloads byte for byte, and pages that stay inert whatever the records say.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import type { CatalogueReport, RecordReport } from '../../src/model/index.ts';
import { ROOT, runMain } from '../cli/run-cli.ts';
import { attr, decodeEntities, elementText, startTags, type Tag } from './html-scan.ts';

const DEMO = join(ROOT, 'content', 'mechanisms');
const FIXTURES = join(ROOT, 'tests', 'site', 'fixtures');
const demoIds = readdirSync(DEMO)
  .filter((f) => f.endsWith('.yaml'))
  .map((f) => f.slice(0, -5))
  .sort();
const HOSTILE = 'hostile-record';
const BROKEN = 'broken-record';

let content = '';
let out = '';

beforeAll(() => {
  // Built once for the whole run by tests/global-site-builds.ts: the demo plus the two fixtures.
  content = inject('fixtureContent');
  out = inject('fixtureSite');
});

const read = (path: string) => readFileSync(join(out, path), 'utf8');
const page = (id: string) => read(`m/${id}/index.html`);

function filesUnder(dir: string, ext: string): string[] {
  return readdirSync(dir, { recursive: true, encoding: 'utf8' })
    .filter((f) => f.endsWith(ext))
    .map((f) => join(dir, f));
}

describe('the demo catalogue builds', () => {
  it('gives every demo record a page with KaTeX', () => {
    for (const id of demoIds) {
      const html = page(id);
      expect(html, id).toContain('class="katex"');
      // The layout's caution is in the footer of every page.
      expect(html, id).toMatch(/calorimetry, local codes and\s+licensed practice/);
    }
  });

  it('renders each part of a full record: steps, overall equation, rate laws with derivations, orders, plots, sources', () => {
    const html = page('kx7-hydroarylation-alkene-first');
    for (const anchor of [
      'overall',
      'steps',
      'species',
      'rate-laws',
      'orders',
      'plots',
      'diagnostics',
      'notes',
      'references',
      'downloads',
    ])
      expect(html).toContain(`id="${anchor}"`);
    expect(html).toContain('<details class="derivation"');
    expect(html).toContain('Rate-determining step with fast pre-equilibria');
    expect(html).toContain('Steady-state approximation');
    expect(html).toContain('✓ consistent');
    expect(html).toContain('role="img"');
    expect(html).toContain('href="/systems/kx7-hydroarylation/"');
    // Label species link to their system's own pages.
    expect(html).toMatch(/href="\/s\/kx7-hydroarylation\/[a-z0-9-]+\/"/);
    expect(html).toContain('href="https://doi.org/10.5555/chmg.2026.0007"');
    expect(html).toContain('id="L1"');
    // No record in the demo mentions hazards, so no caution box above the content.
    expect(html).not.toContain('class="caution"');
    // A contradicted observation is said in words, not colour alone.
    expect(page('kx7-hydroarylation-arene-first')).toContain('✗ contradicted');
  });

  it('links each diagnostic to its line in the source listing', () => {
    const html = page('kx7-hydroarylation-arene-first');
    const links = [...html.matchAll(/href="#L(\d+)"[^>]*>line \d+/g)].map((m) => m[1]);
    expect(links.length).toBeGreaterThan(0);
    for (const line of links) expect(html).toContain(`id="L${line}"`);
  });

  it('links only to pages and files the build wrote (species, systems, downloads, anchors)', () => {
    for (const id of [...demoIds, HOSTILE, BROKEN]) {
      const html = page(id);
      const ids = new Set(
        startTags(html)
          .map((t) => attr(t, 'id'))
          .filter((x) => x !== undefined),
      );
      for (const tag of startTags(html).filter((t) => t.name === 'a')) {
        const href = attr(tag, 'href');
        if (href === undefined || /^https?:/.test(href)) continue;
        if (href.startsWith('#')) {
          expect(ids.has(decodeURIComponent(href.slice(1))), `${id}: ${href}`).toBe(true);
          continue;
        }
        const path = decodeURIComponent(href.split('#')[0]!);
        expect(existsSync(join(out, path.endsWith('/') ? `${path}index.html` : path)), `${id}: ${href}`).toBe(true);
      }
    }
  });

  it('serves each record source byte for byte', () => {
    for (const id of demoIds)
      expect(readFileSync(join(out, 'm', id, `${id}.yaml`)), id).toEqual(readFileSync(join(DEMO, `${id}.yaml`)));
  });

  it('offers each derivable record as SBML, the same document as `mechatlas export --sbml`', async () => {
    for (const id of demoIds) {
      const sbml = readFileSync(join(out, 'm', id, `${id}.sbml.xml`), 'utf8');
      expect(sbml, id).toContain('level="3" version="2"');
      expect(page(id), id).toContain(`${id}.sbml.xml`);
    }
    const id = demoIds[0]!;
    expect(readFileSync(join(out, 'm', id, `${id}.sbml.xml`), 'utf8')).toBe(
      (await runMain(['export', '--sbml', join(DEMO, `${id}.yaml`)])).stdout,
    );
    expect(existsSync(join(out, 'm', BROKEN, `${BROKEN}.sbml.xml`))).toBe(false);
  });

  it('publishes the JSON API: the same report as `mechatlas check --format json`', async () => {
    const all = JSON.parse(read('api/mechanisms.json')) as CatalogueReport;
    expect(all.tool.name).toBe('mechatlas');
    expect(all.records.map((r) => r.id).sort()).toEqual([...demoIds, BROKEN, HOSTILE].sort());
    const cli = await runMain(['check', content, '--format', 'json']);
    const fromCli = JSON.parse(cli.stdout) as CatalogueReport;
    expect(all.summary).toEqual(fromCli.summary);
    const withoutFiles = (r: RecordReport) =>
      JSON.parse(JSON.stringify(r, (k, v: unknown) => (k === 'file' ? undefined : v))) as unknown;
    for (const record of fromCli.records) {
      const published = all.records.find((r) => r.id === record.id)!;
      expect(withoutFiles(published), record.id).toEqual(withoutFiles(record));
      // Paths are the repository's relative ones, never the build machine's absolute paths.
      expect(published.file.startsWith('/')).toBe(false);
      expect(JSON.parse(read(`api/m/${record.id}.json`))).toEqual(published);
    }
    const species = JSON.parse(read('api/species.json')) as {
      species: { symbol: string; slug: string; occurrences: unknown[] }[];
    };
    expect(species.species.find((s) => s.symbol === 'Cat')?.occurrences.length).toBeGreaterThan(1);
  });

  it('loads no asset from the network: every stylesheet, script, font and image is local', () => {
    const pages = filesUnder(out, '.html');
    expect(pages.length).toBeGreaterThan(demoIds.length);
    for (const file of pages) {
      for (const tag of startTags(readFileSync(file, 'utf8'))) {
        if (tag.name === 'a') continue; // links to DOIs and references are not assets
        for (const [name, value] of tag.attrs) {
          if (['src', 'href', 'srcset', 'poster', 'data', 'xlink:href', 'action'].includes(name))
            expect(value, `${relative(out, file)} <${tag.name} ${name}>`).not.toMatch(/^\s*(https?:)?\/\//i);
        }
      }
    }
    for (const file of filesUnder(out, '.css'))
      expect(readFileSync(file, 'utf8'), relative(out, file)).not.toMatch(
        /url\(\s*['"]?(https?:)?\/\/|@import\s+['"]?(url\()?\s*['"]?(https?:)?\/\//i,
      );
  });
});

/** Attributes a browser would run or follow into script. */
function dangerous(tags: Tag[]): string[] {
  const found: string[] = [];
  for (const tag of tags) {
    for (const [name, value] of tag.attrs) {
      if (/^on/.test(name)) found.push(`<${tag.name} ${name}="${value}">`);
      if (/^\s*(javascript|data|vbscript):/i.test(value.replace(/[\u0000-\u0020]/g, '')))
        found.push(`<${tag.name} ${name}="${value}">`);
    }
    if (
      ['script', 'iframe', 'object', 'embed', 'base', 'meta'].includes(tag.name) &&
      !(tag.name === 'meta' && !attr(tag, 'http-equiv'))
    )
      found.push(`<${tag.name}>`);
  }
  return found;
}

describe('pages stay inert whatever a record says', () => {
  it('shows the hostile record as text: no script, no handlers, no javascript: or data: links', () => {
    const html = page(HOSTILE);
    expect(dangerous(startTags(html))).toEqual([]);
    // Read as a browser does: `<script>` inside a quoted attribute value is text, not a tag.
    expect(startTags(html).filter((t) => t.name === 'script')).toEqual([]);
    // The notes' ![img](javascript:…) keeps its alt text and loses its address.
    expect(
      startTags(html)
        .filter((t) => t.name === 'img')
        .map((t) => attr(t, 'src')),
    ).toEqual([undefined]);
  });

  it('keeps the hostile text visible, escaped', () => {
    const html = page(HOSTILE);
    expect(elementText(html, /<h1[^>]*>/, 'h1')).toBe(
      '<script>alert("title")</script> "><svg onload=alert(1)> <img src=x onerror=alert(1)>',
    );
    expect(html).toContain('&lt;script&gt;alert(&quot;tag&quot;)&lt;/script&gt;');
    expect(html).toContain('&lt;script&gt;alert(&quot;name&quot;)&lt;/script&gt;');
    expect(html).toContain('&lt;script&gt;alert(&quot;step&quot;)&lt;/script&gt;');
    // Links only to http(s) and DOIs: the javascript: and data: references are shown as text.
    expect(decodeEntities(html)).toContain('javascript:alert(1)');
    const external = startTags(html)
      .filter((t) => t.name === 'a' && !/^[#/]/.test(attr(t, 'href') ?? '#'))
      .map((t) => attr(t, 'href'));
    expect(external).toEqual(['https://doi.org/10.1234/%22%3E%3Cscript%3Ealert(1)%3C/script%3E']);
  });

  it('renders math in the notes with trust off: no \\href link, and a huge \\rule clamped to maxSize', () => {
    const html = page(HOSTILE);
    const notes = html.slice(html.indexOf('id="notes"'), html.indexOf('id="references"'));
    expect(notes).toContain('class="katex"');
    // \href and \url are not rendered as links (trust off), and the Markdown links to javascript:
    // and data: addresses keep their text without an address.
    expect(notes).toMatch(/>\\href</);
    expect(
      startTags(notes)
        .filter((t) => t.name === 'a')
        .map((t) => attr(t, 'href')),
    ).toEqual([undefined, undefined]);
    // The raw HTML of the notes is dropped, not passed through (its inner text stays, as text).
    expect(notes).toContain('raw link');
    expect(notes).not.toMatch(/<a[^>]*>raw link/);
    const sizes = [...html.matchAll(/style="([^"]*)"/g)].flatMap((m) =>
      [...m[1]!.matchAll(/(-?[\d.]+)em/g)].map((x) => Math.abs(Number(x[1]))),
    );
    expect(Math.max(...sizes)).toBeLessThanOrEqual(12);
    expect(html).toMatch(/class="mord rule"[^>]*border-right-width:\s*10em/);
  });

  it('shows the safety caution where a record speaks of scale-up or exotherms', () => {
    expect(page(HOSTILE)).toContain('class="caution"');
  });

  it('gives a record with errors and no derivation a page with its diagnostics', () => {
    const html = page(BROKEN);
    expect(html).toContain('record/schema');
    expect(html).toContain(
      'the record has an unknown field &#39;&lt;script&gt;alert(&quot;key&quot;)&lt;/script&gt;&#39;',
    );
    expect(html).toContain('href="#L5"');
    expect(html).toContain('id="L5"');
    expect(dangerous(startTags(html))).toEqual([]);
    expect(readFileSync(join(out, 'm', BROKEN, `${BROKEN}.yaml`))).toEqual(
      readFileSync(join(FIXTURES, `${BROKEN}.yaml`)),
    );
  });

  it('leaves no handler or script URL on any page of the catalogue', () => {
    for (const file of filesUnder(out, '.html')) {
      const found = dangerous(startTags(readFileSync(file, 'utf8'))).filter((d) => d !== '<script>');
      expect(found, relative(out, file)).toEqual([]);
    }
  });
});

it('the build wrote its pages where asked', () => {
  expect(existsSync(join(out, 'm', HOSTILE, 'index.html'))).toBe(true);
});
