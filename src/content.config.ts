/**
 * Content collections fed by our own loader, which reads the catalogue through src/site (our
 * records, schema and derivations; not Astro's YAML parser, which keeps no source positions). A
 * record with errors still gets its page, showing its diagnostics.
 */
import { defineCollection } from 'astro:content';
import { resolve, sep } from 'node:path';
import { forgetCatalogue, loadCatalogue, type Catalogue } from './site/index.ts';

interface LoaderContext {
  store: { clear(): void; set(e: { id: string; data: Record<string, unknown>; digest?: string }): boolean };
  logger: { info(m: string): void; warn(m: string): void };
  generateDigest(d: Record<string, unknown> | string): string;
  /** present only while serving (`mechatlas live`, Astro's dev server) */
  watcher?: { add(path: string): void; on(event: string, listener: (path: string) => void): void };
}

// While serving, each collection reloads when a file of the content folder is saved, added or removed.
const reloads = new Map<string, () => Promise<void>>();
let watching = false;

function watchContent(watcher: NonNullable<LoaderContext['watcher']>, logger: LoaderContext['logger']): void {
  if (watching) return;
  watching = true;
  const folder = resolve(process.env['MECHATLAS_CONTENT'] ?? 'content/mechanisms');
  watcher.add(folder);
  const changed = (path: string) => {
    if (!resolve(path).startsWith(folder + sep)) return;
    forgetCatalogue();
    logger.info(`reloading the catalogue: ${path.slice(folder.length + 1)} changed`);
    for (const reload of reloads.values()) void reload();
  };
  for (const event of ['change', 'add', 'unlink']) watcher.on(event, changed);
}

function catalogueLoader<T>(name: string, pick: (c: Catalogue) => { id: string; data: T }[]) {
  async function fill({ store, logger, generateDigest }: LoaderContext) {
    const catalogue = await loadCatalogue();
    store.clear();
    for (const { id, data } of pick(catalogue)) {
      const plain = JSON.parse(JSON.stringify(data)) as Record<string, unknown>;
      store.set({ id, data: plain, digest: generateDigest(plain) });
    }
    if (name === 'mechatlas-mechanisms') {
      const errors = catalogue.records.reduce((n, r) => n + r.errors, 0);
      const message = `${catalogue.records.length} records, ${errors} with errors`;
      if (errors > 0) logger.warn(message);
      else logger.info(message);
    }
  }
  return {
    name,
    async load(context: LoaderContext) {
      await fill(context);
      const { watcher, logger } = context;
      if (!watcher) return;
      reloads.set(name, () => fill(context).catch((error: Error) => logger.warn(`reload failed: ${error.message}`)));
      watchContent(watcher, logger);
    },
  };
}

export const collections = {
  mechanisms: defineCollection({
    loader: catalogueLoader('mechatlas-mechanisms', (c) => c.records.map((r) => ({ id: r.id, data: r }))),
  }),
  species: defineCollection({
    loader: catalogueLoader('mechatlas-species', (c) => c.species.map((s) => ({ id: s.slug, data: s }))),
  }),
  systems: defineCollection({
    loader: catalogueLoader('mechatlas-systems', (c) => c.systems.map((s) => ({ id: s.system, data: s }))),
  }),
};
