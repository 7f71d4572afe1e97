/**
 * Loads and derives a set of record files: the shared first half of `check`, `derive` and the
 * site build. Every file is checked even when others fail. Each record is loaded and its cache
 * key made first; the records the cache does not hold are derived (in worker threads, when the
 * caller brings a `deriver` and there are enough of them), stored, and then every record gets
 * its data read and its diagnostics placed, in the order the files were given.
 */
import {
  deriveMechanism,
  fitDerivation,
  type Derivation,
  type DeriveOptions,
  type KineticData,
} from '../engine/index.ts';
import { diagnostic, type Diagnostic, type MechanismRecord } from '../model/index.ts';
import { loadRecordFile, placeDiagnostics, recordId, type LoadedRecord } from '../records/index.ts';
import type { DerivationCache } from './derivation-cache.ts';
import { derivationKey } from './derivation-key.ts';
import { readRecordData } from './read-record-data.ts';

/** One record file as checked: what was loaded, the record where it is valid, its derivation and every diagnostic placed. */
export interface CheckedRecord {
  id: string;
  file: string;
  loaded: LoadedRecord;
  record?: MechanismRecord;
  derivation?: Derivation;
  /** the observations' data sets that read cleanly, in canonical units (for fitting) */
  data?: KineticData[];
  /** every diagnostic of the record, with file, line and column */
  diagnostics: Diagnostic[];
  /** the record's key in the derivation cache, where a cache was used */
  cacheKey?: string;
}

/** A derivation to be made elsewhere (another thread): the valid record, by its file; `series`: simulate the plotted series too. */
export interface DerivationJob {
  file: string;
  record: MechanismRecord;
  series?: boolean;
}

/**
 * What came of a job: the derivation (and its encoded bytes, for the cache), the failure, or
 * undefined where the record is to be derived in this thread after all.
 */
export type DerivationOutcome =
  { derivation: Derivation; encoded?: Uint8Array; encodedSeries?: Uint8Array } | { error: Error } | undefined;

/** Derives many records at once (a pool of threads), the outcomes in the jobs' order; `done` after each. */
export type Deriver = (
  jobs: readonly DerivationJob[],
  options: DeriveOptions,
  done: () => void,
) => Promise<DerivationOutcome[]>;

/** How records are derived: a cache, a deriver for many at once, and progress. All optional. */
export interface Pipeline {
  cache?: DerivationCache;
  deriver?: Deriver;
  /** the fewest records to derive that make handing them to the deriver worth it (default 8) */
  deriverThreshold?: number;
  /** the site's plotted series are wanted too: a deriver makes them beside the derivation, into the cache */
  series?: boolean;
  /** called after each record is derived or found in the cache */
  progress?: (done: number, total: number) => void;
}

/** Loads, validates and derives one record file; engine diagnostics get file, line and column. */
export async function checkRecordFile(
  path: string,
  options: DeriveOptions = {},
  pipeline: Pipeline = {},
): Promise<CheckedRecord> {
  const [checked] = await checkRecordFiles([path], options, pipeline);
  return checked!;
}

interface Pending {
  path: string;
  loaded?: LoadedRecord;
  key?: string;
  derivation?: Derivation;
  failure?: unknown;
}

/** Checks files, each once, deriving only what the cache does not hold; the order stays the files' order. */
export async function checkRecordFiles(
  paths: readonly string[],
  options: DeriveOptions = {},
  pipeline: Pipeline = {},
): Promise<CheckedRecord[]> {
  const { cache } = pipeline;
  const pending: Pending[] = [];
  let done = 0;
  const tick = () => pipeline.progress?.(++done, paths.length);
  for (const path of paths) {
    const item: Pending = { path };
    pending.push(item);
    try {
      item.loaded = await loadRecordFile(path);
      if (!item.loaded.record || !cache) continue;
      item.key = await derivationKey(item.loaded, options, cache.engine);
      const stored = cache.read(item.key, 'derivation') as Derivation | undefined;
      if (stored) {
        item.derivation = stored;
        tick();
      }
    } catch (error) {
      item.failure = error;
    }
  }
  const misses = pending.filter((p) => p.loaded?.record && !p.derivation && p.failure === undefined);
  const useDeriver = pipeline.deriver && misses.length >= (pipeline.deriverThreshold ?? 8);
  if (useDeriver) {
    const series = pipeline.series === true && cache !== undefined;
    const jobs = misses.map((p) => ({ file: p.path, record: p.loaded!.record!, ...(series && { series }) }));
    const outcomes = await pipeline.deriver!(jobs, options, tick);
    outcomes.forEach((outcome, i) => {
      const item = misses[i]!;
      if (outcome === undefined) deriveHere(item, options, cache, () => undefined);
      else if ('error' in outcome) item.failure = outcome.error;
      else {
        item.derivation = outcome.derivation;
        if (cache && item.key && outcome.encoded) cache.writeEncoded(item.key, 'derivation', outcome.encoded);
        if (cache && item.key && outcome.encodedSeries) cache.writeEncoded(item.key, 'series', outcome.encodedSeries);
      }
    });
  } else for (const item of misses) deriveHere(item, options, cache, tick);
  const out: CheckedRecord[] = [];
  for (const item of pending) {
    if (!item.loaded?.record && item.failure === undefined) tick();
    out.push(await finish(item));
  }
  return out;
}

/** Derives a record in this thread and stores it. */
function deriveHere(item: Pending, options: DeriveOptions, cache: DerivationCache | undefined, tick: () => void): void {
  try {
    item.derivation = deriveMechanism(item.loaded!.record!, options);
    if (cache && item.key) cache.write(item.key, 'derivation', item.derivation);
  } catch (error) {
    item.failure = error;
  }
  tick();
}

/** A record with its data read and every diagnostic placed; a failure on the way is an internal failure. */
async function finish(item: Pending): Promise<CheckedRecord> {
  const { path, loaded, derivation: derived } = item;
  if (item.failure !== undefined || !loaded) return internalFailure(path, loaded, item.failure);
  try {
    const base = { id: loaded.id, file: loaded.file, loaded };
    if (!loaded.record || !derived) return { ...base, diagnostics: placeDiagnostics(loaded, loaded.diagnostics) };
    const species = derived.mechanism && [...derived.mechanism.species.keys()];
    const read = await readRecordData(loaded, species);
    const derivation = fitDerivation(derived, loaded.record, read.data);
    const diagnostics = placeDiagnostics(loaded, [
      ...loaded.diagnostics,
      ...derivation.diagnostics,
      ...read.diagnostics,
    ]);
    return {
      ...base,
      record: loaded.record,
      derivation,
      ...(read.data.length > 0 ? { data: read.data } : {}),
      diagnostics,
      ...(item.key !== undefined ? { cacheKey: item.key } : {}),
    };
  } catch (error) {
    return internalFailure(path, loaded, error);
  }
}

/**
 * A failure of mechatlas itself on one record (an exception, where every problem should be a
 * diagnostic): an `internal/failure` error on that record, so the rest are still checked.
 */
function internalFailure(path: string, loaded: LoadedRecord | undefined, error: unknown): CheckedRecord {
  const what = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
  const message = `mechatlas failed while checking this record (${what.split('\n')[0]!.slice(0, 200)})`;
  const note = 'a fault in mechatlas, not in the record: please report it to the mechatlas maintainers with this file';
  const failure = diagnostic('internal/failure', 'error', message, { file: path, line: 1, column: 1, note });
  const read = loaded ?? { id: recordId(path), file: path, source: '', diagnostics: [], locate: () => undefined };
  const diagnostics = [...placeDiagnostics(read, read.diagnostics), failure];
  return { id: read.id, file: path, loaded: { ...read, diagnostics }, diagnostics };
}
