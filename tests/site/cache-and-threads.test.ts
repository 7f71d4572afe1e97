/**
 * The compiled command gives the same bytes whichever way the records were derived: `check` with
 * one thread or several, with the cache cold, warm or turned off; and the demo site built with
 * no cache and one thread is the site the shared demo build made (cache and threads on).
 */
import { createHash } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { afterAll, describe, expect, inject, it } from 'vitest';
import { ROOT, runCli } from '../cli/run-cli.ts';

const work = mkdtempSync(join(tmpdir(), 'mechatlas-threads-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** Every file under `dir` with the hash of its bytes. */
function tree(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const entry of readdirSync(dir, { recursive: true, withFileTypes: true })) {
    if (!entry.isFile()) continue;
    const path = join(entry.parentPath, entry.name);
    out[relative(dir, path)] = createHash('sha256').update(readFileSync(path)).digest('hex');
  }
  return out;
}

describe('derived alike by threads and the cache', () => {
  it('check: the same report with 1 or 3 threads, cold, warm and without the cache', () => {
    const targets = ['content/mechanisms', 'tests/fixtures/ok'];
    const env = { MECHATLAS_CACHE_DIR: join(work, 'cache') };
    const run = (...args: string[]) => {
      const r = runCli(['check', ...targets, '--format', 'json', ...args], ROOT, env);
      expect(r.stderr).toBe('');
      return r.stdout;
    };
    const reference = run('--no-cache', '--workers', '1');
    expect(JSON.parse(reference).records.length).toBeGreaterThan(15);
    expect(run('--no-cache', '--workers', '3')).toBe(reference);
    expect(run('--workers', '3')).toBe(reference); // cold: derived in threads, stored
    expect(run('--workers', '1')).toBe(reference); // warm
    expect(run('--workers', '3')).toBe(reference);
  }, 300_000);

  it('build: no cache and one thread make the same site, byte for byte', () => {
    const site = join(work, 'site');
    const r = runCli(['build', '--out', site, '--no-cache', '--workers', '1'], ROOT, {}, 400_000);
    expect(r.code).toBe(0);
    expect(tree(site)).toEqual(tree(inject('demoSite')));
  }, 400_000);
});
