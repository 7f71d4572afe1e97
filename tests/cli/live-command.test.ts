/**
 * `mechatlas live`: the compiled command starts Astro's development server on a copy of the demo
 * catalogue, serves a record's page, shows a saved change on that page, and stops on Ctrl-C
 * (SIGINT) with status 0. Skipped where this machine cannot listen on a local port.
 */
import { spawn } from 'node:child_process';
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ROOT } from './run-cli.ts';

const BIN = fileURLToPath(new URL('../../bin/mechatlas.mjs', import.meta.url));

/** A port free on 127.0.0.1 just now, or undefined where listening is not allowed. */
function freePort(): Promise<number | undefined> {
  return new Promise((done) => {
    const server = createServer();
    server.once('error', () => done(undefined));
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => done(typeof address === 'object' && address ? address.port : undefined));
    });
  });
}

const port = await freePort();

/** The page's text once it contains `wanted`, asking again until the deadline. */
async function pageWith(url: string, wanted: string, deadline: number): Promise<string> {
  let last = '';
  while (Date.now() < deadline) {
    const response = await fetch(url).catch(() => undefined);
    last = response ? await response.text() : '';
    if (response?.status === 200 && last.includes(wanted)) return last;
    await new Promise((r) => setTimeout(r, 1000));
  }
  return last;
}

describe.skipIf(port === undefined)('mechatlas live', () => {
  it('serves a record’s page, shows a saved change, and stops on Ctrl-C', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'mechatlas-live-test-'));
    cpSync(join(ROOT, 'content'), dir, { recursive: true });
    const content = join(dir, 'mechanisms');
    const child = spawn(process.execPath, [BIN, 'live', '--content', content, '--port', String(port)], {
      cwd: dir,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (d: Buffer) => void (output += d.toString()));
    child.stderr.on('data', (d: Buffer) => void (output += d.toString()));
    const exited = new Promise<number | null>((done) => child.once('exit', (code) => done(code)));
    try {
      const deadline = Date.now() + 150_000;
      const url = `http://127.0.0.1:${port}/m/kx7-hydroarylation-arene-first/`;
      const page = await pageWith(url, '<title>KX-7 hydroarylation', deadline);
      expect(page, output).toContain('<title>KX-7 hydroarylation');
      expect(output).toContain(`serving the catalogue of ${content} at http://127.0.0.1:${port}/`);
      const file = join(content, 'kx7-hydroarylation-arene-first.yaml');
      writeFileSync(file, readFileSync(file, 'utf8').replace(/^title: .*$/m, 'title: Saved while serving'));
      expect(await pageWith(url, '<title>Saved while serving', deadline), output).toContain(
        '<title>Saved while serving',
      );
    } finally {
      child.kill('SIGINT');
    }
    expect(await exited, output).toBe(0);
    expect(output).toContain('stopped');
  }, 240_000);
});
