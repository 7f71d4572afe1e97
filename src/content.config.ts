/**
 * Content collections fed by our own loader, which reads the catalogue through src/site (our
 * records, schema and derivations; not Astro's YAML parser, which keeps no source positions). A
 * record with errors still gets its page, showing its diagnostics.
 */
import { defineCollection } from 'astro:content';
import { loadCatalogue, type Catalogue } from './site/index.ts';

interface LoaderContext {
  store: { clear(): void; set(e: { id: string; data: Record<string, unknown>; digest?: string }): boolean };
  logger: { info(m: string): void; warn(m: string): void };
  generateDigest(d: Record<string, unknown> | string): string;
}

function catalogueLoader<T>(name: string, pick: (c: Catalogue) => { id: string; data: T }[]) {
  return {
    name,
    async load({ store, logger, generateDigest }: LoaderContext) {
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
