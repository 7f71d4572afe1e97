/** `mechatlas fmt`: --check writes nothing and exits 1 listing what would change; fmt writes, and the chemistry is the same after. */
import { cpSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli, runMain } from './run-cli.ts';

/** A copy of the demo catalogue in a folder of its own. */
function demoCopy(): string {
  const dir = mkdtempSync(join(tmpdir(), 'mechatlas-fmt-'));
  cpSync(join(ROOT, 'content', 'mechanisms'), dir, { recursive: true });
  return dir;
}

function snapshot(dir: string): Record<string, string> {
  return Object.fromEntries(readdirSync(dir).map((f) => [f, readFileSync(join(dir, f), 'utf8')]));
}

/** What a record derives, without where its findings are (formatting moves lines). */
function chemistry(json: string): unknown {
  return JSON.parse(json).records.map((r: Record<string, unknown>) => ({
    ...r,
    diagnostics: (r['diagnostics'] as { rule: string; message: string }[]).map((d) => [d.rule, d.message]),
  }));
}

describe('mechatlas fmt', () => {
  it('--check lists what would change, writes nothing, exits 1; fmt formats and keeps the chemistry', async () => {
    const dir = demoCopy();
    const before = snapshot(dir);
    const report = (await runMain(['check', '--format', 'json', dir])).stdout;
    const check = await runMain(['fmt', '--check', dir]);
    const listed = check.stdout.split('\n').filter((l) => l.startsWith('would change: '));
    expect(snapshot(dir)).toEqual(before);
    if (listed.length === 0) {
      expect(check.code).toBe(0);
      return;
    }
    expect(check.code).toBe(1);
    const written = await runMain(['fmt', dir]);
    expect(written.code).toBe(0);
    expect(written.stdout.split('\n').filter((l) => l.startsWith('formatted: '))).toHaveLength(listed.length);
    expect(await runMain(['fmt', '--check', dir])).toMatchObject({ code: 0 });
    expect(chemistry((await runMain(['check', '--format', 'json', dir])).stdout)).toEqual(chemistry(report));
  });

  it('leaves a file it cannot parse byte for byte, says where, and exits 1', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'mechatlas-fmt-'));
    const broken = 'title: x\nsteps:\n  - equation: "A -> B\n';
    writeFileSync(join(dir, 'broken.yaml'), broken);
    const run = await runMain(['fmt', dir]);
    expect(run.code).toBe(1);
    expect(readFileSync(join(dir, 'broken.yaml'), 'utf8')).toBe(broken);
    expect(run.stdout).toContain('broken.yaml is left as it is:');
    expect(run.stdout).toMatch(/\[record\/yaml\] .*\n +at line 3, column \d+/);
  });

  it('exits 2 on a path that does not exist, and runs as the compiled binary', async () => {
    expect((await runMain(['fmt', 'no/such/folder'])).code).toBe(2);
    const dir = mkdtempSync(join(tmpdir(), 'mechatlas-fmt-'));
    writeFileSync(join(dir, 'r.yaml'), 'system: s\ntitle: T\n');
    const run = runCli(['fmt', '--check', dir]);
    expect(run.code).toBe(1);
    expect(run.stdout).toContain('would change:');
    expect(readFileSync(join(dir, 'r.yaml'), 'utf8')).toBe('system: s\ntitle: T\n');
    expect(runCli(['fmt', dir]).code).toBe(0);
    expect(readFileSync(join(dir, 'r.yaml'), 'utf8')).toBe('title: T\nsystem: s\n');
  });
});
