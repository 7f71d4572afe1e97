/**
 * Typed access to the site's content collections (filled by src/content.config.ts from the
 * catalogue): the collections store plain JSON, so the types are restored here once.
 */
import { getCollection } from 'astro:content';
import type { SpeciesPage } from '../catalogue/catalogue.ts';
import type { RecordView } from '../site/record-view.ts';
import type { SystemView } from '../site/system-view.ts';

/** A species page, with the charge where the catalogue provides one. */
export type AtlasSpecies = SpeciesPage & { charge?: number };

/** Every record, sorted by id. */
export async function atlasRecords(): Promise<RecordView[]> {
  return (await getCollection('mechanisms')).map((e) => e.data as unknown as RecordView).sort((a, b) => a.id.localeCompare(b.id));
}

/** Every species, in the catalogue's order. */
export async function atlasSpecies(): Promise<AtlasSpecies[]> {
  return (await getCollection('species')).map((e) => e.data as unknown as AtlasSpecies).sort((a, b) => a.symbol.localeCompare(b.symbol));
}

/** Every reaction system, sorted by name. */
export async function atlasSystems(): Promise<SystemView[]> {
  return (await getCollection('systems')).map((e) => e.data as unknown as SystemView).sort((a, b) => a.system.localeCompare(b.system));
}

/** Species symbol → page slug, for links. */
export async function atlasSlugs(): Promise<Map<string, string>> {
  return new Map((await atlasSpecies()).map((s) => [s.symbol, s.slug]));
}
