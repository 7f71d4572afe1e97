/**
 * `mechatlas build [--content DIR] [--out DIR] [--strict]`: builds the catalogue site from a
 * folder of records (the same Astro build, pointed elsewhere). Records with errors get pages that
 * show their diagnostics; the build reports them and only fails on them with --strict.
 */
import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { UsageError, type Output } from './output.ts';
import type { CatalogueReport } from '../model/index.ts';
import { summaryLine } from '../render/index.ts';

/** The package's own folder (where astro.config.mjs is), from this file's place in src/cli/ or lib/. */
function packageRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  while (!existsSync(join(dir, 'astro.config.mjs'))) {
    const parent = dirname(dir);
    if (parent === dir) throw new Error('mechatlas: cannot find the package folder (astro.config.mjs)');
    dir = parent;
  }
  return dir;
}

export interface BuildOptions {
  content: string;
  out: string;
  strict: boolean;
}

/** Builds the site; exit 1 only with --strict and errors in some record. */
export async function buildCommand(options: BuildOptions, out: Output): Promise<number> {
  const content = resolve(options.content);
  const outDir = resolve(options.out);
  if (!existsSync(content)) throw new UsageError(`no such folder: ${options.content}`);
  process.env['MECHATLAS_CONTENT'] = content;
  // Astro's anonymous usage reporting stays off: a catalogue build sends nothing anywhere.
  process.env['ASTRO_TELEMETRY_DISABLED'] = '1';
  process.env['MECHATLAS_OUT'] = outDir;
  const { build } = await import('astro');
  // Astro keeps the content data store in its cache folder and reads it back during the build, so
  // builds into different folders (parallel test files) each get their own cache, outside the tree.
  const cacheDir = join(
    tmpdir(),
    'mechatlas-astro-cache',
    createHash('sha256').update(outDir).digest('hex').slice(0, 12),
  );
  await build({ root: packageRoot(), outDir, cacheDir, logLevel: 'warn' });
  // The site's own API holds the report the build derived; the records are not derived twice.
  const report = JSON.parse(await readFile(join(outDir, 'api', 'mechanisms.json'), 'utf8')) as CatalogueReport;
  out.stdout(`built the catalogue of ${options.content} into ${options.out}/ — ${summaryLine(report)}\n`);
  if (report.summary.errors > 0)
    out.stderr(`${report.summary.errors} error(s) in the records: see ${options.out}/checks/ or run mechatlas check\n`);
  return options.strict && report.summary.errors > 0 ? 1 : 0;
}
