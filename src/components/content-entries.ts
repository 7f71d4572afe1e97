/**
 * Typed access to the site's content collections (filled by src/content.config.ts from the
 * catalogue). The collections store plain JSON; the one place their types are restored is here.
 */
import { getCollection } from 'astro:content';
import type { RecordView, SpeciesPage, SystemView } from '../site/index.ts';

/** What each collection holds. */
interface Collections {
  mechanisms: RecordView;
  species: SpeciesPage;
  systems: SystemView;
}

/** Every entry of a collection as its id and its typed data, in the collection's order. */
export async function entries<K extends keyof Collections>(name: K): Promise<{ id: string; data: Collections[K] }[]> {
  const stored = await getCollection(name);
  // The loader stored exactly these shapes (content.config.ts); Astro types them as plain records.
  return stored.map((e) => ({ id: e.id, data: e.data as unknown as Collections[K] }));
}

/** Every record, sorted by id. */
export async function atlasRecords(): Promise<RecordView[]> {
  return (await entries('mechanisms')).map((e) => e.data).sort((a, b) => a.id.localeCompare(b.id));
}

/** Every species: the formulas shared by the catalogue by symbol, then each system's labels. */
export async function atlasSpecies(): Promise<SpeciesPage[]> {
  return (await entries('species'))
    .map((e) => e.data)
    .sort(
      (a, b) =>
        Number(a.system !== undefined) - Number(b.system !== undefined) ||
        (a.system ?? '').localeCompare(b.system ?? '') ||
        a.symbol.localeCompare(b.symbol),
    );
}

/** Every reaction system, sorted by name. */
export async function atlasSystems(): Promise<SystemView[]> {
  return (await entries('systems')).map((e) => e.data).sort((a, b) => a.system.localeCompare(b.system));
}
