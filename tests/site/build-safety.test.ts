/**
 * `mechatlas build` on temporary folders: it refuses folders it must not replace (the content,
 * a folder holding .git, one it did not make), a build killed half-way leaves the previous site
 * byte for byte, and two builds at once both publish the whole site, the same bytes, with no
 * server chunk or working file of the other in it.
 */
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { cpSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { describe, expect, inject, it } from 'vitest';
import { ROOT, runCli } from '../cli/run-cli.ts';

const BIN = join(ROOT, 'bin', 'mechatlas.mjs');
const CONTENT = join(ROOT, 'tests', 'fixtures', 'ok');

/** Every file under `dir` (dot files included) with the hash of its bytes. */
function tree(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const entry of readdirSync(dir, { recursive: true, withFileTypes: true })) {
    if (!entry.isFile()) continue;
    const path = join(entry.parentPath, entry.name);
    out[relative(dir, path)] = createHash('sha256').update(readFileSync(path)).digest('hex');
  }
  return out;
}

/** Runs a build as a child process from `cwd`; resolves with its exit code and output. */
function build(
  args: string[],
  cwd = ROOT,
): {
  child: ReturnType<typeof spawn>;
  done: Promise<{ code: number | null; output: string }>;
} {
  const child = spawn(process.execPath, [BIN, 'build', ...args], { cwd, stdio: ['ignore', 'pipe', 'pipe'] });
  let output = '';
  child.stdout.on('data', (d: Buffer) => void (output += d.toString()));
  child.stderr.on('data', (d: Buffer) => void (output += d.toString()));
  const done = new Promise<{ code: number | null; output: string }>((resolve) =>
    child.on('close', (code) => resolve({ code, output })),
  );
  return { child, done };
}

describe('build refuses a folder it must not replace', () => {
  it('the content folder, and one above it', () => {
    // The content one level down in a folder of its own, so the folder above it holds nothing else
    // that a build must not replace (the system's temporary folder may hold the working folder).
    const content = join(mkdtempSync(join(tmpdir(), 'mechatlas-content-')), 'records');
    cpSync(CONTENT, content, { recursive: true });
    const before = tree(content);
    for (const out of [content, join(content, '..')]) {
      const run = runCli(['build', '--content', content, '--out', out]);
      expect(run.code).toBe(2);
      expect(run.stderr).toMatch(/^mechatlas: refusing to build into .*content folder/);
    }
    expect(tree(content)).toEqual(before);
  });

  it('a folder holding .git, even with --force', () => {
    const out = mkdtempSync(join(tmpdir(), 'mechatlas-out-git-'));
    mkdirSync(join(out, '.git'));
    writeFileSync(join(out, '.git', 'HEAD'), 'ref: refs/heads/main\n');
    writeFileSync(join(out, 'index.html'), '<p>the published site</p>\n');
    const before = tree(out);
    for (const force of [[], ['--force']]) {
      const run = runCli(['build', '--content', CONTENT, '--out', out, ...force]);
      expect(run.code).toBe(2);
      expect(run.stderr).toContain('git repository');
    }
    expect(tree(out)).toEqual(before);
  });

  it('a non-empty folder without the marker of an earlier build', () => {
    const out = mkdtempSync(join(tmpdir(), 'mechatlas-out-mine-'));
    writeFileSync(join(out, 'thesis.tex'), '\\documentclass{article}\n');
    const run = runCli(['build', '--content', CONTENT, '--out', out]);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('--force');
    expect(readFileSync(join(out, 'thesis.tex'), 'utf8')).toBe('\\documentclass{article}\n');
  });
});

describe('a build swaps the new site in only when it is complete', () => {
  it('leaves the previous site whole when killed half-way, and the next build clears what it left', async () => {
    const work = mkdtempSync(join(tmpdir(), 'mechatlas-killed-'));
    const out = join(work, 'site');
    cpSync(inject('demoSite'), out, { recursive: true });
    expect(existsSync(join(out, '.mechatlas-site'))).toBe(true);
    const before = tree(out);
    const running = build(['--content', CONTENT, '--out', out]);
    // Killed while Astro works: its working folder exists by then.
    const cache = join(ROOT, 'node_modules', '.cache', 'mechatlas');
    const pid = running.child.pid!;
    for (let i = 0; i < 600 && !readdirSync(cache).some((n) => n.startsWith(`build-${pid}-`)); i++)
      await new Promise((r) => setTimeout(r, 50));
    await new Promise((r) => setTimeout(r, 1500));
    running.child.kill('SIGKILL');
    await running.done;
    expect(tree(out)).toEqual(before);
    // The next build replaces the site (it carries the marker) and leaves nothing of the killed one.
    const next = await build(['--content', CONTENT, '--out', out]).done;
    expect(next.code, next.output).toBe(0);
    expect(readdirSync(work)).toEqual(['site']);
    expect(readdirSync(cache).filter((n) => n.startsWith(`build-${pid}-`))).toEqual([]);
    expect(existsSync(join(out, 'm', 'record-minimal', 'index.html'))).toBe(true);
  }, 240_000);

  it('runs two builds at once one after the other: both sites whole and byte-identical, --force replaces', async () => {
    const work = mkdtempSync(join(tmpdir(), 'mechatlas-twice-'));
    // The records, and files whose names cannot be pages: left out of the site, and said so.
    const content = join(work, 'content');
    cpSync(CONTENT, content, { recursive: true });
    const record = readFileSync(join(CONTENT, 'record-minimal.yaml'));
    for (const name of ['...yaml', '.yaml', `${'a'.repeat(250)}.yaml`, 'twin.yaml', 'twin.yml'])
      writeFileSync(join(content, name), record);
    const forced = join(work, 'forced');
    mkdirSync(forced);
    writeFileSync(join(forced, 'old.txt'), 'replace me\n');
    const [a, b] = await Promise.all([
      // From a folder with no node_modules above it, with relative paths, as a catalogue repository runs it.
      build(['--content', 'content', '--out', 'a', '--strict'], work).done,
      build(['--content', 'content', '--out', 'forced', '--force'], work).done,
    ]);
    expect(a.code, a.output).toBe(1);
    expect(b.code, b.output).toBe(0);
    expect(b.output.match(/left out of the site/g)).toHaveLength(5);
    // One page per record under m/, beside the index of all mechanisms.
    expect(
      readdirSync(join(work, 'a', 'm'))
        .filter((f) => f !== 'index.html')
        .sort(),
    ).toEqual(
      readdirSync(CONTENT)
        .map((f) => f.slice(0, -5))
        .sort(),
    );
    expect(readFileSync(join(work, 'a', 'index.html'), 'utf8')).toContain('role="search"');
    const api = JSON.parse(readFileSync(join(work, 'a', 'api', 'mechanisms.json'), 'utf8')) as {
      records: { file: string }[];
    };
    expect(api.records.map((r) => r.file)).toContain('content/record-minimal.yaml');
    const siteA = tree(join(work, 'a'));
    expect(tree(forced)).toEqual(siteA);
    expect(Object.keys(siteA)).toContain('index.html');
    // No server chunk or Astro working file reached either site.
    expect(Object.keys(siteA).filter((f) => /\.mjs$|^chunks\/|^\.prerender|manifest/.test(f))).toEqual([]);
    // Beside the sites, only the derivation cache the builds share (in the folder they ran from).
    expect(readdirSync(work).sort()).toEqual(['.mechatlas-cache', 'a', 'content', 'forced']);
  }, 300_000);
});
