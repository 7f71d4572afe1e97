/**
 * Builds the sites the site and browser tests read, once per test run and one after the other:
 * Astro builds in one tree must not overlap (they share its generated files). The demo site, and
 * the demo plus two records made to attack the pages (hostile) and to fail (broken). Skipped when
 * the run is filtered to other tests.
 */
import { execFile } from 'node:child_process';
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    /** the demo catalogue's built site */
    demoSite: string;
    /** the demo plus the hostile and broken fixtures: content folder and built site */
    fixtureContent: string;
    fixtureSite: string;
  }
}

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const run = promisify(execFile);

async function build(content: string, out: string): Promise<void> {
  await run(process.execPath, [join(ROOT, 'bin', 'mechatlas.mjs'), 'build', '--content', content, '--out', out], {
    cwd: ROOT,
    timeout: 400_000,
    maxBuffer: 32 * 1024 * 1024,
  });
}

/** Builds both sites unless the run's file filters leave out every site and browser test. */
export default async function setup(project: TestProject): Promise<() => void> {
  const argv = process.argv.slice(2).filter((a) => !a.startsWith('-') && a !== 'run' && a !== 'watch');
  const needed = argv.length === 0 || argv.some((a) => /site|browser|^tests\/?$/.test(a));
  const work = mkdtempSync(join(tmpdir(), 'mechatlas-sites-'));
  const demoSite = join(work, 'demo');
  const fixtureContent = join(work, 'fixture-content');
  const fixtureSite = join(work, 'fixture-site');
  if (needed) {
    await build(join(ROOT, 'content', 'mechanisms'), demoSite);
    cpSync(join(ROOT, 'content', 'mechanisms'), fixtureContent, { recursive: true });
    for (const id of ['hostile-record', 'broken-record'])
      cpSync(join(ROOT, 'tests', 'site', 'fixtures', `${id}.yaml`), join(fixtureContent, `${id}.yaml`));
    await build(fixtureContent, fixtureSite);
  }
  project.provide('demoSite', demoSite);
  project.provide('fixtureContent', fixtureContent);
  project.provide('fixtureSite', fixtureSite);
  return () => rmSync(work, { recursive: true, force: true });
}
