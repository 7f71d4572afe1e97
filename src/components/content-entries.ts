/**
 * Typed access to the catalogue the pages render: read once per build from src/site (which loads,
 * derives — through the derivation cache — and builds the page models once per process), made
 * plain JSON once (what the pages saw when they read content collections), and shared by
 * reference with every page. Reading a content collection deep-copies every entry on each call,
 * and species and mechanism pages each read whole collections: quadratic in the catalogue.
 * The lists handed out are frozen (typed as plain arrays for the pages), since every page shares them.
 */
import { loadCatalogue, type Catalogue, type RecordView, type SpeciesPage, type SystemView } from '../site/index.ts';

/** What each list of entries holds. */
interface Collections {
  mechanisms: RecordView;
  species: SpeciesPage;
  systems: SystemView;
}

interface Shared {
  entries: { [K in keyof Collections]: readonly { id: string; data: Collections[K] }[] };
  records: readonly RecordView[];
  species: readonly SpeciesPage[];
  systems: readonly SystemView[];
}

let shared: Promise<Shared> | undefined;

function share(catalogue: Catalogue): Shared {
  const plain = JSON.parse(JSON.stringify(catalogue)) as Catalogue;
  const records = Object.freeze([...plain.records].sort((a, b) => a.id.localeCompare(b.id)));
  // The formulas shared by the catalogue first, by symbol; then each system's labels.
  const species = Object.freeze(
    [...plain.species].sort(
      (a, b) =>
        Number(a.system !== undefined) - Number(b.system !== undefined) ||
        (a.system ?? '').localeCompare(b.system ?? '') ||
        a.symbol.localeCompare(b.symbol),
    ),
  );
  const systems = Object.freeze([...plain.systems].sort((a, b) => a.system.localeCompare(b.system)));
  return {
    entries: {
      mechanisms: Object.freeze(plain.records.map((r) => ({ id: r.id, data: r }))),
      species: Object.freeze(plain.species.map((s) => ({ id: s.slug, data: s }))),
      systems: Object.freeze(plain.systems.map((s) => ({ id: s.system, data: s }))),
    },
    records,
    species,
    systems,
  };
}

function catalogue(): Promise<Shared> {
  shared ??= loadCatalogue().then(share);
  return shared;
}

/** Every entry of a list as its id and its data, in the catalogue's order (a new array; the entries are shared). */
export async function entries<K extends keyof Collections>(name: K): Promise<{ id: string; data: Collections[K] }[]> {
  return [...((await catalogue()).entries[name] as readonly { id: string; data: Collections[K] }[])];
}

/** Every record, sorted by id. */
export async function atlasRecords(): Promise<RecordView[]> {
  return (await catalogue()).records as RecordView[];
}

/** Every species: the formulas shared by the catalogue by symbol, then each system's labels. */
export async function atlasSpecies(): Promise<SpeciesPage[]> {
  return (await catalogue()).species as SpeciesPage[];
}

/** Every reaction system, sorted by name. */
export async function atlasSystems(): Promise<SystemView[]> {
  return (await catalogue()).systems as SystemView[];
}
