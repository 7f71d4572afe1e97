/**
 * The demo site at a desktop width and at a 390 px phone width, in Debian's Chromium: no page
 * scrolls sideways, stacked cards stay inside the screen, label species have a page per system,
 * a formula query lists species first, and the checks-page filters work with and without script.
 * Skipped only where /usr/bin/chromium is missing and this is not CI (as tests/browser/site.test.ts).
 */
import { existsSync } from 'node:fs';
import { readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { serveStatic, type StaticServer } from './static-server.ts';

const CHROMIUM = '/usr/bin/chromium';
const run = existsSync(CHROMIUM) || Boolean(process.env['CI']);
const WIDTHS = [1280, 390] as const;

/** Every page of a built site, as paths from its root (`/`, `/m/x/`, …). */
async function pagesOf(root: string, prefix = '/'): Promise<string[]> {
  const out: string[] = [];
  for (const entry of await readdir(join(root, prefix), { withFileTypes: true })) {
    if (entry.isDirectory()) out.push(...(await pagesOf(root, `${prefix}${entry.name}/`)));
    else if (entry.name === 'index.html') out.push(prefix);
  }
  return out.sort();
}

describe.skipIf(!run)('the demo site on a desktop and on a phone', () => {
  let out = '';
  let server: StaticServer;
  let browser: Browser;
  const contexts = new Map<number, BrowserContext>();

  beforeAll(async () => {
    out = inject('demoSite');
    server = await serveStatic(out);
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      headless: true,
      args: ['--no-sandbox', '--disable-gpu'],
    });
    for (const width of WIDTHS) {
      const context = await browser.newContext({ viewport: { width, height: 900 } });
      await context.route('**/*', (route) =>
        new URL(route.request().url()).hostname === '127.0.0.1' ? route.continue() : route.abort(),
      );
      contexts.set(width, context);
    }
  }, 180_000);

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  }, 30_000);

  async function open(width: number, path: string): Promise<Page> {
    const page = await contexts.get(width)!.newPage();
    const response = await page.goto(`${server.origin}${path}`, { waitUntil: 'load' });
    expect(response?.status(), path).toBe(200);
    return page;
  }

  for (const width of WIDTHS) {
    it(`no page of the demo scrolls sideways at ${width} px, and stacked cards fit the screen`, async () => {
      const paths = await pagesOf(out);
      expect(paths).toEqual(expect.arrayContaining(['/', '/m/', '/checks/', '/systems/kx7-hydroarylation/']));
      const page = await contexts.get(width)!.newPage();
      const wide: string[] = [];
      for (const path of paths) {
        await page.goto(`${server.origin}${path}`, { waitUntil: 'load' });
        const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
        if (overflow > 0) wide.push(`${path} by ${overflow}px`);
        if (width < 600) {
          const cards = await page.$$eval('.cards-below-600', (boxes) =>
            boxes.filter((b) => b.scrollWidth > b.clientWidth + 1).map((b) => b.getAttribute('aria-label') ?? ''),
          );
          for (const label of cards) wide.push(`${path}: cards "${label}" wider than the screen`);
        }
      }
      expect(wide).toEqual([]);
      await page.close();
    }, 300_000);
  }

  it('scroll containers can be reached from the keyboard and are labelled', async () => {
    const page = await open(390, '/systems/kx7-hydroarylation/');
    const boxes = await page.$$eval('.table-wrap', (all) =>
      all.map((b) => ({ tab: b.getAttribute('tabindex'), label: b.getAttribute('aria-label') ?? '' })),
    );
    expect(boxes.length).toBeGreaterThan(0);
    for (const box of boxes) {
      expect(box.tab).toBe('0');
      expect(box.label.length).toBeGreaterThan(3);
    }
    await page.close();
  }, 60_000);

  it('a label species has its own page in each system: Cat of the KX-7 system', async () => {
    const page = await open(390, '/s/kx7-hydroarylation/cat/');
    expect(await page.locator('[data-label-of="kx7-hydroarylation"]').count()).toBe(1);
    const mechanisms = await page.$$eval('tr[data-mechanism]', (rows) =>
      rows.map((r) => r.getAttribute('data-mechanism')),
    );
    expect(mechanisms.every((m) => m?.startsWith('kx7-hydroarylation-'))).toBe(true);
    // A label is never shared across systems: no page sits at the bare symbol.
    const bare = await page.goto(`${server.origin}/s/cat/`);
    expect(bare?.status()).toBe(404);
    // The mechanism page links its labels to its system's pages.
    await page.goto(`${server.origin}/m/kx7-hydroarylation-alkene-first/`);
    const links = await page.$$eval('section:has(> h2#species) a', (as) => as.map((a) => a.getAttribute('href') ?? ''));
    expect(links.length).toBeGreaterThan(0);
    for (const href of links) expect(href).toMatch(/^\/s\/kx7-hydroarylation\//);
    await page.close();
  }, 60_000);

  it('a formula query lists matching species first, and tag-only matches apart', async () => {
    const page = await open(1280, '/search/?q=Cl');
    await page.waitForFunction(() => (document.querySelector('#search-count')?.textContent ?? '').includes('“Cl”'));
    const sections = await page.$$eval('#search-results > section h2', (hs) => hs.map((h) => h.id));
    expect(sections[0]).toBe('results-species-heading');
    const symbols = await page.$$eval('#results-species > li', (items) =>
      items.map((li) => li.getAttribute('data-symbol')),
    );
    expect(symbols).toEqual(expect.arrayContaining(['Cl2', 'HCl', 'CF3Cl']));
    // Cl2 is written with a subscript.
    expect(await page.locator('#results-species > li[data-symbol="Cl2"] .symbol sub').first().innerText()).toBe('2');
    // Mechanisms found through one of their species are not mixed with those found through words only.
    const bySpecies = await page.$$eval('#results-mechanisms > li', (items) =>
      items.map((li) => li.getAttribute('data-id')),
    );
    expect(bySpecies).toEqual(expect.arrayContaining(['fluoroform-chlorination-cl-termination']));
    const loose = await page.$$eval('#results-loose > li', (items) => items.map((li) => li.getAttribute('data-id')));
    for (const id of loose) expect(bySpecies).not.toContain(id);
    await page.close();
  }, 60_000);

  it('the checks page filters by severity, rule and system without reloading', async () => {
    const page = await open(390, '/checks/');
    const all = await page.locator('tr[data-severity]').count();
    expect(all).toBeGreaterThan(0);
    await page.selectOption('#checks-filter select[name="severity"]', 'warning');
    const visible = () =>
      page.$$eval('tr[data-severity]', (rows) =>
        rows.filter((r) => (r as HTMLElement).offsetParent !== null).map((r) => r.getAttribute('data-severity')),
      );
    const warnings = await visible();
    expect(warnings.length).toBeGreaterThan(0);
    expect(new Set(warnings)).toEqual(new Set(['warning']));
    expect(page.url()).toContain('severity=warning');
    await page.selectOption('#checks-filter select[name="severity"]', '');
    await page.selectOption('#checks-filter select[name="system"]', 'isomerase-mimic-turnover');
    const rows = await page.$$eval('tr[data-severity]', (rs) =>
      rs.filter((r) => (r as HTMLElement).offsetParent !== null).map((r) => r.getAttribute('data-system')),
    );
    expect(new Set(rows)).toEqual(new Set(['isomerase-mimic-turnover']));
    // A shared address restores the filter.
    await page.goto(`${server.origin}/checks/?rule=route%2Foff-route`);
    const rules = await page.$$eval('tr[data-rule]', (rs) =>
      rs.filter((r) => (r as HTMLElement).offsetParent !== null).map((r) => r.getAttribute('data-rule')),
    );
    expect(new Set(rules)).toEqual(new Set(['route/off-route']));
    await page.close();
  }, 60_000);

  it('without script the checks page lists every check and hides the filter form', async () => {
    const context = await browser.newContext({ viewport: { width: 390, height: 900 }, javaScriptEnabled: false });
    const page = await context.newPage();
    await page.goto(`${server.origin}/checks/?severity=warning`);
    expect(await page.locator('#checks-filter').isVisible()).toBe(false);
    const rows = await page.$$eval(
      'tr[data-severity]',
      (rs) => rs.filter((r) => (r as HTMLElement).offsetParent !== null).length,
    );
    expect(rows).toBe(await page.locator('tr[data-severity]').count());
    // The index of anchors still leads to each severity and rule.
    expect(await page.locator('nav.toc a[href="#warning"]').count()).toBeGreaterThan(0);
    await context.close();
  }, 60_000);
});
