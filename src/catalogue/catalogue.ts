/**
 * A folder of records loaded and derived once, with what several pages or reports need across
 * records: each reaction system's rivals judged against the observations of all of them, and
 * the species as they occur across the catalogue. The site and the CLI render from this; neither
 * derives again.
 */
import { relative } from 'node:path';
import {
  firstObservationSeries,
  judgeObservations,
  simulationBasis,
  type ConcentrationSeries,
  type ObservationCheck,
  type SystemDataSet,
} from '../engine/index.ts';
import type { Observation } from '../model/index.ts';
import { findRecordFiles, isPublishable } from '../records/index.ts';
import { checkRecordFiles, type CheckedRecord, type Pipeline } from './check-records.ts';
import { withSystemFits } from './fit-systems.ts';
import { plottedSeries, type StoredSeries } from './plotted-series.ts';

/** One record of the catalogue: checked and derived, with its source text and its simulated series. */
export interface CatalogueRecord extends CheckedRecord {
  /** every data set of the record's system, each rival fitted to it and ranked */
  systemFits?: SystemDataSet[];
  /** the file as the catalogue names it: relative to the working folder */
  file: string;
  /** the YAML as written */
  source: string;
  /** concentrations against time for the first observation that can be simulated */
  series?: ConcentrationSeries;
}

/** The rival proposals of one reaction system. */
export interface CatalogueSystem {
  system: string;
  /** record ids, sorted */
  rivals: string[];
  /** each rival without errors judged against the observations of every rival (pooled, each once) */
  judged: Map<string, ObservationCheck[]>;
  /** every data set of the system with each rival fitted and ranked */
  fits?: SystemDataSet[];
}

export interface Catalogue {
  /** every record, in file order */
  records: CatalogueRecord[];
  /** systems by name */
  systems: CatalogueSystem[];
}

/**
 * Loads, checks and derives every publishable record of a folder (through the pipeline's cache
 * and deriver), then judges the rivals of each system — always afresh, since any rival's change
 * changes the pooled observations.
 */
export async function loadCatalogue(folder: string, pipeline: Pipeline = {}): Promise<Catalogue> {
  const { files } = await findRecordFiles([folder]);
  const records: CatalogueRecord[] = [];
  for (const checked of await checkRecordFiles(files, {}, pipeline)) {
    const file = checked.file;
    // A file name that cannot be a page (unsafe, too long, an id given twice) stays out; `build` reports it.
    if (!isPublishable(checked)) continue;
    // Names relative to where the command ran (`build` runs Astro from the package folder).
    const cwd = process.env['MECHATLAS_CWD'] ?? process.cwd();
    const named = relative(cwd, file) || file;
    // A diagnostic in a data file keeps that file's name, made relative like the record's.
    const rename = (f: string) => (f === file ? named : relative(cwd, f) || f);
    const diagnostics = checked.diagnostics.map((d) => (d.file === undefined ? d : { ...d, file: rename(d.file) }));
    // The text the loader read (never a second read: the file may have changed, or be a pipe).
    const record: CatalogueRecord = { ...checked, file: named, diagnostics, source: checked.loaded.source };
    const series = seriesOf(checked, pipeline);
    if (series) record.series = series;
    records.push(record);
  }
  // Rivals are fitted to each other's data once, for the whole folder.
  const fitted = withSystemFits(records);
  return { records: fitted, systems: judgeSystems(fitted) };
}

/** The record's plotted concentration series: from the cache (a worker may have stored it), or simulated and stored. */
function seriesOf(checked: CheckedRecord, { cache }: Pipeline): ConcentrationSeries | undefined {
  const { cacheKey: key } = checked;
  const stored = key !== undefined ? (cache?.read(key, 'series') as StoredSeries | undefined) : undefined;
  if (stored && typeof stored === 'object') return stored.series;
  const made = plottedSeries(checked.record, checked.derivation);
  if (key !== undefined) cache?.write(key, 'series', made);
  return made.series;
}

function judgeSystems(records: readonly CatalogueRecord[]): CatalogueSystem[] {
  const bySystem = new Map<string, CatalogueRecord[]>();
  for (const r of records) if (r.record) bySystem.set(r.record.system, [...(bySystem.get(r.record.system) ?? []), r]);
  return [...bySystem]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([system, rivals]) => {
      const fits = rivals.find((r) => r.systemFits)?.systemFits;
      return { system, rivals: rivals.map((r) => r.id), judged: judgeAcrossRivals(rivals), ...(fits && { fits }) };
    });
}

/** Each rival without errors, judged by its own rate laws against the pooled observations of the system. */
function judgeAcrossRivals(rivals: readonly CatalogueRecord[]): Map<string, ObservationCheck[]> {
  const pooled: Observation[] = [];
  const seen = new Set<string>();
  for (const r of rivals) {
    for (const o of r.record?.observations ?? []) {
      const key = JSON.stringify(o);
      if (!seen.has(key)) pooled.push(o);
      seen.add(key);
    }
  }
  const judged = new Map<string, ObservationCheck[]>();
  for (const r of rivals) {
    if (!r.record || !r.derivation || r.diagnostics.some((d) => d.severity === 'error')) continue;
    judged.set(r.id, judgeObservations(r.derivation, pooled, r.record.status));
  }
  return judged;
}
