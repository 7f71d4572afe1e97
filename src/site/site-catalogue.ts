/**
 * The site's view of a catalogue, built once per folder and build: a page model for every
 * record, the species across records with their roles, and the systems with their rivals side
 * by side. Every value comes from the catalogue layer; nothing here derives chemistry.
 */
import { systemFitViews } from './fit-view.ts';
import { loadCatalogue as loadRecords, type Catalogue as LoadedCatalogue } from '../catalogue/index.ts';
import type { ObservationJson } from '../model/index.ts';
import { observationJson } from '../render/index.ts';
import { recordView, type RecordView } from './record-view.ts';
import { speciesSlugs } from './species-slug.ts';
import { systemView, type SystemView } from './system-view.ts';

export interface SpeciesOccurrence {
  mechanism: string;
  title: string;
  role?: string;
  buffered: boolean;
}

export interface SpeciesPage {
  symbol: string;
  slug: string;
  names: string[];
  formula?: string;
  charge?: number;
  inchi: string[];
  smiles: string[];
  aliases: string[];
  occurrences: SpeciesOccurrence[];
}

export interface Catalogue {
  records: RecordView[];
  species: SpeciesPage[];
  systems: SystemView[];
  /** symbol → slug, for links */
  slugs: Record<string, string>;
}

const cache = new Map<string, Promise<Catalogue>>();

/** The catalogue of a folder of records (default: the demo content), built once. */
export function loadCatalogue(folder = process.env['MECHATLAS_CONTENT'] ?? 'content/mechanisms'): Promise<Catalogue> {
  let pending = cache.get(folder);
  if (!pending) {
    pending = loadRecords(folder).then(siteCatalogue);
    cache.set(folder, pending);
  }
  return pending;
}

/** The page models of a loaded catalogue. */
export function siteCatalogue(loaded: LoadedCatalogue): Catalogue {
  const records = loaded.records.map(recordView);
  const slugs = Object.fromEntries(speciesSlugs(records.flatMap((r) => r.species.map((s) => s.symbol))));
  const systems = loaded.systems.map((s) => {
    const rivals = s.rivals.map((id) => records.find((r) => r.id === id)!);
    const judged = new Map<string, ObservationJson[]>(
      [...s.judged].map(([id, checks]) => [id, checks.map(observationJson)]),
    );
    const fits = systemFitViews(s.fits);
    return fits.length > 0 ? { ...systemView(s.system, rivals, judged), fits } : systemView(s.system, rivals, judged);
  });
  return { records, species: speciesPages(records, slugs), systems, slugs };
}

function speciesPages(records: RecordView[], slugs: Record<string, string>): SpeciesPage[] {
  const pages = new Map<string, SpeciesPage>();
  for (const record of records) {
    for (const s of record.species) {
      const page = pages.get(s.symbol) ?? {
        symbol: s.symbol,
        slug: slugs[s.symbol]!,
        names: [],
        inchi: [],
        smiles: [],
        aliases: [],
        occurrences: [],
      };
      addUnique(page.names, s.name);
      addUnique(page.inchi, s.inchi);
      addUnique(page.smiles, s.smiles);
      for (const a of s.aliases) addUnique(page.aliases, a);
      if (s.formula && !page.formula) page.formula = s.formula;
      if (s.charge !== undefined && page.charge === undefined) page.charge = s.charge;
      page.occurrences.push({
        mechanism: record.id,
        title: record.title,
        ...(s.role && { role: s.role }),
        buffered: s.buffered,
      });
      pages.set(s.symbol, page);
    }
  }
  return [...pages.values()].sort((a, b) => a.symbol.localeCompare(b.symbol));
}

function addUnique(list: string[], value: string | undefined): void {
  if (value && !list.includes(value)) list.push(value);
}
