/**
 * The built catalogue in a real browser: Debian's Chromium driven by playwright-core (which
 * downloads no browser). The demo site is built once into a temporary folder and served from
 * 127.0.0.1; any request to another host fails the suite. Screenshots go to test-artifacts/.
 *
 * Skipped only where /usr/bin/chromium is missing and this is not CI; CI (.ci/run) installs it.
 */
import { existsSync } from 'node:fs';
import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { SearchDoc } from '../../src/search/search-doc.ts';
import { serveStatic, type StaticServer } from './static-server.ts';

const CHROMIUM = '/usr/bin/chromium';
const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const ARTIFACTS = join(ROOT, 'test-artifacts');
const hasChromium = existsSync(CHROMIUM);
const inCI = Boolean(process.env['CI']);
const suite =
  hasChromium || inCI
    ? 'the catalogue site in Chromium'
    : `the catalogue site in Chromium — SKIPPED: ${CHROMIUM} is missing (apt-get install chromium; CI always runs this suite)`;

if (!hasChromium && !inCI)
  console.warn(`browser tests skipped: ${CHROMIUM} is missing (apt-get install chromium to run them; CI always does)`);

interface ApiRecord {
  id: string;
  title: string;
  roles?: Record<string, string>;
}
interface ApiSpecies {
  symbol: string;
  slug: string;
  names: string[];
  occurrences: { mechanism: string; role?: string }[];
}

describe.skipIf(!hasChromium && !inCI)(suite, () => {
  let out = '';
  let server: StaticServer;
  let browser: Browser;
  let context: BrowserContext;
  const requests: string[] = [];
  const consoleErrors: string[] = [];

  beforeAll(async () => {
    // The demo site is built once for the whole run by tests/global-site-builds.ts.
    out = inject('demoSite');
    server = await serveStatic(out);
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      headless: true,
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--no-first-run',
      ],
    });
    context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    context.on('request', (request) => requests.push(request.url()));
    // Record first, then refuse: a request to another host fails the last test, and never goes out.
    await context.route('**/*', (route) => (isLocal(route.request().url()) ? route.continue() : route.abort()));
    await mkdir(ARTIFACTS, { recursive: true });
  }, 180_000);

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  }, 30_000);

  /** A new page whose console errors and uncaught exceptions are collected. */
  async function open(path: string): Promise<Page> {
    const page = await context.newPage();
    page.on('console', (message) => {
      if (message.type() === 'error') consoleErrors.push(`${path}: ${message.text()}`);
    });
    page.on('pageerror', (error) => consoleErrors.push(`${path}: ${error.message}`));
    const response = await page.goto(`${server.origin}${path}`, { waitUntil: 'load' });
    expect(response?.status(), `status of ${path}`).toBe(200);
    return page;
  }

  /** The search page once its index has loaded and the first search (from ?q=) has run. */
  async function openSearch(query = ''): Promise<Page> {
    const page = await open(`/search/${query ? `?q=${encodeURIComponent(query)}` : ''}`);
    await page.waitForFunction(() => {
      const count = document.querySelector('#search-count')?.textContent ?? '';
      return count !== '' && !count.startsWith('Loading');
    });
    return page;
  }

  /** Types a query into the search page's box and presses Enter; resolves when it is announced. */
  async function searchFor(page: Page, query: string): Promise<void> {
    await page.fill('#search-q', query);
    await page.press('#search-q', 'Enter');
    await page.waitForFunction(
      (q) => (document.querySelector('#search-count')?.textContent ?? '').includes(`“${q}”`),
      query,
    );
  }

  const mechanismIds = (page: Page) =>
    page.$$eval('#results-mechanisms > li', (items) => items.map((li) => li.getAttribute('data-id') ?? ''));
  const speciesSymbols = (page: Page) =>
    page.$$eval('#results-species > li', (items) => items.map((li) => li.getAttribute('data-symbol') ?? ''));
  const shot = (page: Page, name: string) => page.screenshot({ path: join(ARTIFACTS, name), fullPage: true });

  it('home page loads without console errors and has the search box', async () => {
    const page = await open('/');
    await page.waitForLoadState('networkidle');
    expect(await page.locator('form.search input#home-search').isVisible()).toBe(true);
    await shot(page, 'home.png');
    expect(consoleErrors).toEqual([]);
    await page.close();
  }, 60_000);

  it('the home search box submits to /search/?q= and finds fluoroform by name', async () => {
    const page = await open('/');
    await page.fill('#home-search', 'fluoroform');
    await Promise.all([page.waitForURL(/\/search\/\?q=fluoroform$/), page.press('#home-search', 'Enter')]);
    await page.waitForFunction(() => (document.querySelector('#search-count')?.textContent ?? '').includes('match'));
    expect(await page.inputValue('#search-q')).toBe('fluoroform');
    const ids = await mechanismIds(page);
    expect(ids.slice(0, 2).sort()).toEqual([
      'fluoroform-chlorination-cf3-termination',
      'fluoroform-chlorination-cl-termination',
    ]);
    expect(await speciesSymbols(page)).toContain('CHF3');
    // The matched species is shown with its role in each mechanism.
    const hit = page.locator('li[data-id="fluoroform-chlorination-cl-termination"] li.hit[data-symbol="CHF3"]');
    expect(await hit.getAttribute('data-role')).toBe('reactant');
    expect(await hit.innerText()).toMatch(/CHF3 fluoroform — reactant in this mechanism/);
    expect(await page.locator('#search-count').getAttribute('aria-live')).toBe('polite');
    // The search script is a bundled file, not inline code.
    expect(await page.locator('script:not([src])').count()).toBe(0);
    expect(await page.locator('script[type="module"][src^="/_astro/"]').count()).toBe(1);
    await shot(page, 'search-fluoroform.png');
    await page.close();
  }, 60_000);

  it('an alias finds the species and its mechanisms', async () => {
    const page = await openSearch('trifluoromethane');
    expect((await mechanismIds(page)).sort()).toEqual([
      'fluoroform-chlorination-cf3-termination',
      'fluoroform-chlorination-cl-termination',
    ]);
    // CHF3 first; near names (trifluoromethyl radical, chlorotrifluoromethane) may follow it.
    expect((await speciesSymbols(page))[0]).toBe('CHF3');
    expect(await page.locator('li[data-kind="species"][data-symbol="CHF3"] li[data-role="reactant"]').count()).toBe(2);
    expect(await page.locator('li[data-kind="species"][data-symbol="CHF3"]').innerText()).toContain(
      'also trifluoromethane',
    );
    await page.close();
  }, 60_000);

  it('formulas match exactly and with case: Cl2 finds the chlorination mechanisms, CL2 finds nothing', async () => {
    const page = await openSearch('Cl2');
    const ids = await mechanismIds(page);
    expect(ids.slice(0, 2).sort()).toEqual([
      'fluoroform-chlorination-cf3-termination',
      'fluoroform-chlorination-cl-termination',
    ]);
    expect(
      await page
        .locator('li[data-id="fluoroform-chlorination-cl-termination"] li.hit[data-symbol="Cl2"]')
        .getAttribute('data-role'),
    ).toBe('reactant');
    expect((await speciesSymbols(page))[0]).toBe('Cl2');
    await shot(page, 'search-cl2.png');
    // Every link in the results (mechanisms, species, systems) opens a page.
    const hrefs = await page
      .locator('#search-results a')
      .evaluateAll((links) => links.map((a) => a.getAttribute('href') ?? ''));
    expect(await brokenLinks(page, hrefs)).toEqual([]);

    await searchFor(page, 'CL2');
    expect(await mechanismIds(page)).toEqual([]);
    expect(await speciesSymbols(page)).toEqual([]);
    expect(await page.locator('#search-count').innerText()).toContain('try Cl2');

    // The element-like symbol Cl is a part of Cl2, HCl, Cl• and CF3Cl; CL is part of nothing.
    await searchFor(page, 'Cl');
    expect(await speciesSymbols(page)).toEqual(expect.arrayContaining(['Cl2', 'HCl', 'Cl•', 'CF3Cl']));
    await searchFor(page, 'CL');
    expect(await speciesSymbols(page)).toEqual([]);
    expect(await mechanismIds(page)).toEqual([]);
    await page.close();
  }, 60_000);

  it('filters by role and status, keeps them in the address, and is usable from the keyboard', async () => {
    const page = await openSearch();
    await page.keyboard.type('KX-7');
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => (document.querySelector('#search-count')?.textContent ?? '').includes('“KX-7”'));
    expect((await mechanismIds(page)).length).toBe(3);

    await page.selectOption('#search-role', 'catalyst');
    await page.waitForFunction(() => location.search.includes('role=catalyst'));
    const roles = await page.$$eval('#results-mechanisms li.hit', (items) =>
      items.map((li) => li.getAttribute('data-role')),
    );
    expect(roles.length).toBeGreaterThanOrEqual(3);
    expect(new Set(roles)).toEqual(new Set(['catalyst']));

    await page.selectOption('#search-status', 'favoured');
    await page.waitForFunction(() => location.search.includes('status=favoured'));
    expect(await mechanismIds(page)).toEqual(['kx7-hydroarylation-alkene-first']);
    expect(await page.locator('#search-count').innerText()).toBe(
      '1 mechanism and 1 species match “KX-7” (role catalyst, status favoured).',
    );
    await shot(page, 'search-filters.png');

    // ↓ from the box reaches the first result; Enter follows it.
    await page.focus('#search-q');
    await page.keyboard.press('ArrowDown');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('href'))).toBe(
      '/m/kx7-hydroarylation-alkene-first/',
    );
    await Promise.all([page.waitForURL(/\/m\/kx7-hydroarylation-alkene-first\/$/), page.keyboard.press('Enter')]);
    await page.close();
  }, 60_000);

  it('a link with ?q=&role=&status= restores the search', async () => {
    const page = await openSearch();
    await page.goto(`${server.origin}/search/?q=&role=inhibitor`);
    await page.waitForFunction(() =>
      (document.querySelector('#search-count')?.textContent ?? '').includes('role inhibitor'),
    );
    expect(await page.locator('#search-role').inputValue()).toBe('inhibitor');
    expect((await mechanismIds(page)).sort()).toEqual([
      'isomerase-mimic-product-complex',
      'isomerase-mimic-single-complex',
    ]);
    expect(await speciesSymbols(page)).toEqual(['I']);
    await page.close();
  }, 60_000);

  it('without JavaScript the search page points to the species and systems lists', async () => {
    const plain = await browser.newContext({ javaScriptEnabled: false });
    plain.on('request', (request) => requests.push(request.url()));
    const page = await plain.newPage();
    await page.goto(`${server.origin}/search/?q=fluoroform`);
    const notice = page.locator('.no-script');
    expect(await notice.isVisible()).toBe(true);
    expect(await notice.locator('a').evaluateAll((links) => links.map((a) => a.getAttribute('href')))).toEqual([
      '/species/',
      '/systems/',
    ]);
    expect(await page.locator('#catalogue-search').isVisible()).toBe(false);
    await shot(page, 'search-no-javascript.png');
    await plain.close();
  }, 60_000);

  it('a mechanism page shows its rate law in KaTeX and its orders table', async () => {
    const page = await open('/m/kx7-hydroarylation-alkene-first/');
    const rateLaws = page.locator('section:has(> h2#rate-laws)');
    expect(await rateLaws.count()).toBe(1);
    const katex = rateLaws.locator('.katex');
    expect(await katex.count()).toBeGreaterThan(0);
    expect(await katex.first().isVisible()).toBe(true);
    // KaTeX laid the formula out (its fonts and CSS loaded): the rendered box has a real size.
    const box = await katex.first().boundingBox();
    expect(box?.height ?? 0).toBeGreaterThan(10);
    expect(await rateLaws.locator('.katex-mathml math').count()).toBeGreaterThan(0);
    const orders = page.locator('section:has(> h2#orders) table');
    expect(await orders.count()).toBeGreaterThan(0);
    expect(await orders.first().isVisible()).toBe(true);
    expect(await orders.first().innerText()).toMatch(/\bA\b/);
    await shot(page, 'mechanism.png');
    await rateLaws.screenshot({ path: join(ARTIFACTS, 'mechanism-rate-laws.png') });
    expect(consoleErrors).toEqual([]);
    await page.close();
  }, 60_000);

  it("a mechanism page's species links open species pages", async () => {
    const page = await open('/m/kx7-hydroarylation-alkene-first/');
    const hrefs = await page
      .locator('section:has(> h2#species) a')
      .evaluateAll((links) => links.map((a) => a.getAttribute('href') ?? ''));
    expect(hrefs.length).toBeGreaterThan(0);
    expect(await brokenLinks(page, hrefs), 'species links that do not resolve').toEqual([]);
    await page.close();
  }, 60_000);

  it('a species page lists its roles in every mechanism', async () => {
    const page = await open('/s/kx7-hydroarylation/cat/');
    const rows = page.locator('tr[data-mechanism]');
    expect(await rows.count()).toBe(3);
    expect(await rows.evaluateAll((trs) => trs.map((tr) => tr.getAttribute('data-role')))).toEqual([
      'catalyst',
      'catalyst',
      'catalyst',
    ]);
    expect(await page.locator('main').innerText()).toMatch(/catalyst in 3/i);
    await shot(page, 'species.png');
    expect(consoleErrors).toEqual([]);
    await page.close();
  }, 60_000);

  it('every demo mechanism is found by searching each of its species, by name and by symbol, with its role', async () => {
    const page = await openSearch();
    const { records, names } = await catalogueFacts(page);
    expect(records.length).toBeGreaterThanOrEqual(13);
    const missed: string[] = [];
    const found = new Set<string>();
    for (const record of records) {
      for (const [symbol, role] of Object.entries(record.roles ?? {})) {
        for (const query of [symbol, ...(names.get(symbol) ?? []).slice(0, 1)]) {
          await searchFor(page, query);
          const hit = page.locator(
            `#results-mechanisms > li[data-id="${record.id}"] li.hit[data-symbol="${cssString(symbol)}"]`,
          );
          if ((await hit.count()) === 0) missed.push(`${record.id}: “${query}” (${symbol})`);
          else if ((await hit.first().getAttribute('data-role')) !== role)
            missed.push(
              `${record.id}: “${query}” shows ${symbol} as ${await hit.first().getAttribute('data-role')}, not ${role}`,
            );
          else found.add(record.id);
        }
      }
    }
    expect(missed).toEqual([]);
    expect([...found].sort()).toEqual(records.map((r) => r.id).sort());
    await page.close();
  }, 120_000);

  it('made no request outside 127.0.0.1 and logged no console errors', () => {
    expect(requests.length).toBeGreaterThan(0);
    expect(requests.filter((url) => !isLocal(url))).toEqual([]);
    expect(consoleErrors).toEqual([]);
  });
});

/** Loopback only: the test server's host, or data:/blob: URLs the page makes itself. */
function isLocal(url: string): boolean {
  if (url.startsWith('data:') || url.startsWith('blob:') || url === 'about:blank') return true;
  return new URL(url).hostname === '127.0.0.1';
}

/**
 * Each mechanism with the roles of its species, and each species' names: from the static API
 * (the engine's report) where the site has one, else from the search documents themselves.
 */
async function catalogueFacts(page: Page): Promise<{ records: ApiRecord[]; names: Map<string, string[]> }> {
  const get = async (path: string) => {
    const response = await page.request.get(new URL(path, page.url()).href);
    return response.status() === 200 ? ((await response.json()) as unknown) : undefined;
  };
  const api = (await get('/api/mechanisms.json')) as { records: ApiRecord[] } | undefined;
  const species = (await get('/api/species.json')) as { species: ApiSpecies[] } | undefined;
  if (api && species) return { records: api.records, names: new Map(species.species.map((s) => [s.symbol, s.names])) };
  const bundle = (await get('/search/index.json')) as { docs: SearchDoc[] };
  const records = bundle.docs.flatMap((d) =>
    d.kind === 'mechanism'
      ? [{ id: d.id, title: d.title, roles: Object.fromEntries(d.species.map((s) => [s.symbol, s.role ?? ''])) }]
      : [],
  );
  const names = new Map(
    bundle.docs.flatMap((d) => (d.kind === 'species' ? [[d.symbol, d.identity.names] as const] : [])),
  );
  return { records, names };
}

/** The links among `hrefs` that do not answer 200 on the test server. */
async function brokenLinks(page: Page, hrefs: readonly string[]): Promise<string[]> {
  const broken: string[] = [];
  for (const href of new Set(hrefs)) {
    const response = await page.request.get(new URL(href, page.url()).href);
    if (response.status() !== 200) broken.push(`${href} → ${response.status()}`);
  }
  return broken;
}

/** A value for a CSS attribute selector in double quotes. */
function cssString(value: string): string {
  return value.replace(/["\\]/g, '\\$&');
}
