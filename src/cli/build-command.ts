/**
 * `mechatlas build [--content DIR] [--out DIR] [--strict] [--force]`: builds the catalogue site
 * from a folder of records. Records with errors get pages that show their diagnostics; the build
 * reports them and only fails on them with --strict. The site is built in a folder of its own and
 * swapped in at the end, so nothing in the out folder changes unless the build succeeds, and the
 * out folder is checked first (out-folder.ts): a build never replaces what it did not make.
 */
import { readFile } from 'node:fs/promises';
import { join, relative } from 'node:path';
import { catalogueCache, loadCatalogue, recordFileProblems } from '../catalogue/index.ts';
import type { CatalogueReport } from '../model/index.ts';
import { diagnosticRow, summaryLine } from '../render/index.ts';
import { withBuildWorkspace } from './build-workspace.ts';
import { contentFolder } from './content-folder.ts';
import { EXIT } from './exit-status.ts';
import { checkOutFolder } from './out-folder.ts';
import type { Output } from './output.ts';
import { clearStaleSiblings, swapSiteInto } from './swap-site.ts';
import { threadDeriver } from './derivation-pool.ts';
import { packageRoot } from './package-root.ts';
import { progressLine } from './progress.ts';

export interface BuildOptions {
  content: string;
  out: string;
  strict: boolean;
  /** replace a non-empty out folder that no earlier build made */
  force: boolean;
  /** use the derivation cache (default true) */
  cache?: boolean;
  /** threads deriving records not in the cache (default: one per core) */
  workers?: number;
}

/** Builds the site; exit 1 only with --strict and errors in some record. */
export async function buildCommand(options: BuildOptions, out: Output): Promise<number> {
  const cwd = process.cwd();
  const { content, files } = await contentFolder(options.content);
  const root = packageRoot();
  const target = checkOutFolder(options.out, { content, packageRoot: root, cwd, force: options.force });
  // Files whose name cannot be a page (an unsafe or doubled id) are left out of the site; say so here.
  const leftOut = (await Promise.all(files.map(recordFileProblems))).flat();
  await deriveIntoCache(content, cwd, root, options, files.length, out);
  const report = await withBuildWorkspace(root, out, async (work) => {
    await clearStaleSiblings(target);
    const site = await astroBuild(root, work, content, cwd);
    // The site's own API holds the report the build derived; the records are not derived twice.
    const built = JSON.parse(await readFile(join(site, 'api', 'mechanisms.json'), 'utf8')) as CatalogueReport;
    await swapSiteInto(site, target);
    return built;
  });
  out.stdout(`built the catalogue of ${options.content} into ${options.out}/ — ${summaryLine(report)}\n`);
  for (const d of leftOut) {
    const row = {
      ...d,
      file: relative(cwd, d.file ?? '') || (d.file ?? ''),
      message: `${d.message} (left out of the site)`,
    };
    out.stderr(`${diagnosticRow(row)}\n`);
  }
  const errors = report.summary.errors + leftOut.length;
  if (errors > 0) out.stderr(`${errors} error(s) in the records: see ${options.out}/checks/ or run mechatlas check\n`);
  return options.strict && errors > 0 ? EXIT.findings : EXIT.clean;
}

/**
 * Derives every record not yet in the cache, across threads, before Astro starts: the site's
 * loader then reads each derivation (and plotted series) from the cache instead of deriving in
 * Astro's one thread. Without the cache, the loader derives everything itself.
 */
async function deriveIntoCache(
  content: string,
  cwd: string,
  root: string,
  options: BuildOptions,
  total: number,
  out: Output,
): Promise<void> {
  // The site's loader runs in this process from the package's sources: it finds the cache and
  // the engine's sources through these.
  process.env['MECHATLAS_PACKAGE_ROOT'] = root;
  if (options.cache === false) process.env['MECHATLAS_NO_CACHE'] = '1';
  else delete process.env['MECHATLAS_NO_CACHE'];
  const cache = catalogueCache({ cwd, enabled: options.cache !== false });
  if (!cache) return;
  const deriver = threadDeriver(options.workers);
  const progress = progressLine(out, total, { verb: 'derived' });
  process.env['MECHATLAS_CWD'] = cwd;
  await loadCatalogue(content, { cache, ...(deriver && { deriver }), series: true, progress: progress.update });
  progress.end();
}

/** Runs Astro's build of the package's site over `content` into `<work>/site`, from the package folder. */
async function astroBuild(root: string, work: string, content: string, cwd: string): Promise<string> {
  const site = join(work, 'site');
  process.env['MECHATLAS_CONTENT'] = content;
  process.env['MECHATLAS_OUT'] = site;
  // File names in the site stay relative to where the command was run, not to the package.
  process.env['MECHATLAS_CWD'] = cwd;
  // Astro's anonymous usage reporting stays off: a catalogue build sends nothing anywhere.
  process.env['ASTRO_TELEMETRY_DISABLED'] = '1';
  const { build } = await import('astro');
  process.chdir(root);
  try {
    await build({ root, outDir: site, cacheDir: join(work, 'astro-cache'), logLevel: 'warn' });
  } finally {
    process.chdir(cwd);
  }
  return site;
}
