/**
 * The site's view of a catalogue, built once per folder and build: a page model for every
 * record, the species across records with their roles, and the systems with their rivals side
 * by side. Every value comes from the catalogue layer; nothing here derives chemistry.
 */
import {
  catalogueCache,
  loadCatalogue as loadRecords,
  loadSystemRecords,
  type Catalogue as LoadedCatalogue,
  type LoadedSystemRecord,
} from '../catalogue/index.ts';
import { systemFitViews } from './fit-view.ts';
import type { ObservationJson } from '../model/index.ts';
import { observationJson } from '../render/index.ts';
import { recordView, type RecordView } from './record-view.ts';
import { recordSpeciesSlugs, speciesPages, speciesPageSlugs, type SpeciesPage } from './species-pages.ts';
import { withSystemRecord } from './system-record-view.ts';
import { systemView, type SystemView } from './system-view.ts';

export type { SpeciesOccurrence, SpeciesPage } from './species-pages.ts';

export interface Catalogue {
  records: RecordView[];
  species: SpeciesPage[];
  systems: SystemView[];
  /** formula symbol → slug, for links to the species shared across the catalogue (labels: see each record) */
  slugs: Record<string, string>;
}

const cache = new Map<string, Promise<Catalogue>>();

/**
 * The catalogue of a folder of records (default: the demo content), built once per process; the
 * derivations come from the derivation cache where it holds them (`mechatlas build` fills it
 * before Astro starts), and the plots are drawn once per record.
 */
export function loadCatalogue(folder = process.env['MECHATLAS_CONTENT'] ?? 'content/mechanisms'): Promise<Catalogue> {
  let pending = cache.get(folder);
  if (!pending) {
    const derivations = catalogueCache();
    pending = Promise.all([
      loadRecords(folder, derivations ? { cache: derivations } : {}),
      loadSystemRecords(folder),
    ]).then(([loaded, systems]) => siteCatalogue(loaded, systems));
    cache.set(folder, pending);
  }
  return pending;
}

/** Forgets the catalogue of a folder, so the next load reads its records again (a record was saved while serving). */
export function forgetCatalogue(folder = process.env['MECHATLAS_CONTENT'] ?? 'content/mechanisms'): void {
  cache.delete(folder);
}

/** The page models of a loaded catalogue (with the system records beside it, where there are any). */
export function siteCatalogue(loaded: LoadedCatalogue, systemRecords: readonly LoadedSystemRecord[] = []): Catalogue {
  const records = loaded.records.map(recordView);
  const pageSlugs = speciesPageSlugs(records);
  for (const r of records) r.speciesSlugs = recordSpeciesSlugs(r, pageSlugs);
  const slugs = Object.fromEntries([...pageSlugs].filter(([key]) => !key.includes('\u0000')));
  const systems = loaded.systems.map((s) => {
    const rivals = s.rivals.map((id) => records.find((r) => r.id === id)!);
    const judged = new Map<string, ObservationJson[]>(
      [...s.judged].map(([id, checks]) => [id, checks.map(observationJson)]),
    );
    const view = withSystemRecord(systemView(s.system, rivals, judged), systemRecords);
    const fits = systemFitViews(s.fits);
    return fits.length > 0 ? { ...view, fits } : view;
  });
  return { records, species: speciesPages(records, pageSlugs), systems, slugs };
}
