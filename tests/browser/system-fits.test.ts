/**
 * The fits on a system page in a real browser (Debian's Chromium through playwright-core, as in
 * site.test.ts): for each data set the sentence naming the rival the data favour, the fit table,
 * and the three plots — present, visible, and labelled (an accessible name, axis titles with units,
 * a legend naming each rival). Skipped only where /usr/bin/chromium is missing and this is not CI.
 */
import { existsSync } from 'node:fs';
import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { serveStatic, type StaticServer } from './static-server.ts';

const CHROMIUM = '/usr/bin/chromium';
const ARTIFACTS = join(fileURLToPath(new URL('../..', import.meta.url)), 'test-artifacts');
const run = existsSync(CHROMIUM) || Boolean(process.env['CI']);

describe.skipIf(!run)('fits on the system pages in Chromium', () => {
  let server: StaticServer;
  let browser: Browser;
  const errors: string[] = [];

  beforeAll(async () => {
    server = await serveStatic(inject('demoSite'));
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      headless: true,
      args: ['--no-sandbox', '--disable-gpu'],
    });
    await mkdir(ARTIFACTS, { recursive: true });
  }, 180_000);

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  }, 30_000);

  async function open(path: string): Promise<Page> {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    page.on('pageerror', (error) => errors.push(`${path}: ${error.message}`));
    page.on('console', (m) => (m.type() === 'error' ? errors.push(`${path}: ${m.text()}`) : undefined));
    const response = await page.goto(`${server.origin}${path}`, { waitUntil: 'load' });
    expect(response?.status()).toBe(200);
    return page;
  }

  it('the KX-7 page says which rival the data favour and draws the three plots, labelled', async () => {
    const page = await open('/systems/kx7-hydroarylation/');
    const set = page.locator('[data-fit-set="kx7-rate-table-2026-03"]');
    expect(await set.count()).toBe(1);
    // The demo table was generated from the alkene-first law (content/data/kx7-initial-rates.csv says so).
    expect(await set.locator('[data-favoured]').innerText()).toMatch(
      /data favour kx7-hydroarylation-alkene-first: Akaike weight 0\.\d\d/,
    );
    expect(await set.locator('tr[data-rival="kx7-hydroarylation-arene-first"]').getAttribute('data-rejected')).toBe(
      'true',
    );
    for (const kind of ['fitted', 'residuals', 'order']) {
      const svg = set.locator(`figure[data-plot="${kind}"] svg`);
      expect(await svg.count(), kind).toBe(1);
      expect(await svg.isVisible(), kind).toBe(true);
      const box = await svg.boundingBox();
      expect(box?.width ?? 0, kind).toBeGreaterThan(200);
      expect(await svg.getAttribute('aria-label'), kind).toMatch(/\[A\]/);
      const texts = await svg.locator('text').allTextContents();
      expect(texts, kind).toContain('[A] / M');
      if (kind !== 'residuals')
        expect(
          texts.some((t) => t.startsWith('initial rate / M s')),
          kind,
        ).toBe(true);
    }
    const legend = await set.locator('figure[data-plot="fitted"] svg text.legend').allTextContents();
    expect(legend).toEqual(
      expect.arrayContaining(['measured', 'kx7-hydroarylation-alkene-first', 'kx7-hydroarylation-arene-first']),
    );
    await set.screenshot({ path: join(ARTIFACTS, 'system-fits.png') });
    await page.close();
  }, 60_000);

  it('the pincer page says the survey cannot tell the rivals apart, and suggests no measurement against a rival set apart', async () => {
    const page = await open('/systems/pincer-ligand-exchange/');
    const set = page.locator('[data-fit-set="pincer-survey-table-2026-02"]');
    expect(await set.locator('[data-favoured]').innerText()).toMatch(/do not tell .* apart/);
    // The associative rival is disfavoured for a recorded reason: set apart, so no experiment is proposed to rule it out.
    expect(await set.locator('.next-measurement').count()).toBe(0);
    await page.close();
    expect(errors).toEqual([]);
  }, 60_000);
});
