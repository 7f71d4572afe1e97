/**
 * The whole catalogue for the site, computed once per build: every record checked and derived,
 * the species across records with their roles, and the systems with their rival proposals.
 */
import { readFile } from 'node:fs/promises';
import { relative } from 'node:path';
import { checkRecordFile } from './check-records.ts';
import { recordReport, type ObservationJson } from '../render/report/record-report.ts';
import { deriveMechanism } from '../engine/derive.ts';
import { findRecordFiles } from '../records/index.ts';
import type { MechanismRecord, Observation } from '../model/mechanism-record.ts';
import { recordView, type RecordView } from '../site/record-view.ts';
import { speciesSlugs } from './species-slug.ts';
import { systemView, type SystemView } from '../site/system-view.ts';

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

/** The catalogue of a folder of records (default: the demo content), computed once. */
export function loadCatalogue(folder = process.env['MECHATLAS_CONTENT'] ?? 'content/mechanisms'): Promise<Catalogue> {
  let pending = cache.get(folder);
  if (!pending) {
    pending = buildCatalogue(folder);
    cache.set(folder, pending);
  }
  return pending;
}

async function buildCatalogue(folder: string): Promise<Catalogue> {
  const { files } = await findRecordFiles([folder]);
  const records: RecordView[] = [];
  const sources = new Map<string, MechanismRecord>();
  for (const file of files) {
    const checked = await checkRecordFile(file);
    const view = recordView(checked, await readFile(file, 'utf8'));
    view.file = relative(process.cwd(), file) || file;
    records.push(view);
    if (checked.loaded.record) sources.set(view.id, checked.loaded.record);
  }
  const slugs = Object.fromEntries(speciesSlugs(records.flatMap((r) => r.species.map((s) => s.symbol))));
  return { records, species: speciesPages(records, slugs), systems: systemViews(records, sources), slugs };
}

/**
 * Each rival judged by the engine against the observations of every rival in its system (the
 * record is derived again with the pooled observations, without simulation).
 */
function judgeAcrossRivals(rivals: RecordView[], sources: ReadonlyMap<string, MechanismRecord>): Map<string, ObservationJson[]> {
  const pooled: Observation[] = [];
  const seen = new Set<string>();
  for (const r of rivals) {
    for (const o of sources.get(r.id)?.observations ?? []) {
      const key = JSON.stringify(o);
      if (!seen.has(key)) pooled.push(o);
      seen.add(key);
    }
  }
  const judged = new Map<string, ObservationJson[]>();
  for (const r of rivals) {
    const record = sources.get(r.id);
    if (!record || r.errors > 0) continue;
    const derivation = deriveMechanism({ ...record, observations: pooled }, { simulate: false });
    judged.set(r.id, recordReport({ id: r.id, file: r.file, record, derivation, diagnostics: [] }).observations ?? []);
  }
  return judged;
}

function speciesPages(records: RecordView[], slugs: Record<string, string>): SpeciesPage[] {
  const pages = new Map<string, SpeciesPage>();
  for (const record of records) {
    for (const s of record.species) {
      const page = pages.get(s.symbol) ?? { symbol: s.symbol, slug: slugs[s.symbol]!, names: [], inchi: [], smiles: [], aliases: [], occurrences: [] };
      addUnique(page.names, s.name);
      addUnique(page.inchi, s.inchi);
      addUnique(page.smiles, s.smiles);
      for (const a of s.aliases) addUnique(page.aliases, a);
      if (s.formula && !page.formula) page.formula = s.formula;
      if (s.charge !== undefined && page.charge === undefined) page.charge = s.charge;
      page.occurrences.push({ mechanism: record.id, title: record.title, ...(s.role && { role: s.role }), buffered: s.buffered });
      pages.set(s.symbol, page);
    }
  }
  return [...pages.values()].sort((a, b) => a.symbol.localeCompare(b.symbol));
}

function systemViews(records: RecordView[], sources: ReadonlyMap<string, MechanismRecord>): SystemView[] {
  const bySystem = new Map<string, RecordView[]>();
  for (const r of records) if (r.system) bySystem.set(r.system, [...(bySystem.get(r.system) ?? []), r]);
  return [...bySystem].sort(([a], [b]) => a.localeCompare(b)).map(([system, rivals]) => systemView(system, rivals, judgeAcrossRivals(rivals, sources)));
}

function addUnique(list: string[], value: string | undefined): void {
  if (value && !list.includes(value)) list.push(value);
}
