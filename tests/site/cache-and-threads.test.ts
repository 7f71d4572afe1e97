/**
 * The compiled command gives the same bytes whichever way the records were derived: `check` with
 * one thread or several, with the cache cold, warm or turned off; and the demo site built with
 * no cache and one thread is the site the shared demo build made (cache and threads on).
 */
import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { afterAll, describe, expect, inject, it } from 'vitest';
import { ROOT } from '../cli/run-cli.ts';

/** Runs the compiled command without blocking the test runner (a long spawnSync starves its messages). */
function runCli(
  args: string[],
  env: Record<string, string> = {},
): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      [join(ROOT, 'bin', 'mechatlas.mjs'), ...args],
      { cwd: ROOT, env: { ...process.env, ...env }, maxBuffer: 64 * 1024 * 1024, timeout: 400_000 },
      (error, stdout, stderr) => resolve({ code: error ? Number(error.code ?? -1) : 0, stdout, stderr }),
    );
  });
}

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
  it('check: the same report with 1 or 3 threads, cold, warm and without the cache', async () => {
    const targets = ['content/mechanisms', 'tests/fixtures/ok'];
    const env = { MECHATLAS_CACHE_DIR: join(work, 'cache') };
    const run = async (...args: string[]) => {
      const r = await runCli(['check', ...targets, '--format', 'json', ...args], env);
      expect(r.stderr).toBe('');
      return r.stdout;
    };
    const reference = await run('--no-cache', '--workers', '1');
    expect(JSON.parse(reference).records.length).toBeGreaterThan(15);
    expect(await run('--no-cache', '--workers', '3')).toBe(reference);
    expect(await run('--workers', '3')).toBe(reference); // cold: derived in threads, stored
    expect(await run('--workers', '1')).toBe(reference); // warm
    expect(await run('--workers', '3')).toBe(reference);
  }, 300_000);

  it('build: no cache and one thread make the same site, byte for byte', async () => {
    const site = join(work, 'site');
    const r = await runCli(['build', '--out', site, '--no-cache', '--workers', '1']);
    expect(r.code).toBe(0);
    expect(tree(site)).toEqual(tree(inject('demoSite')));
  }, 400_000);
});
