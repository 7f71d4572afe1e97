/**
 * Loads and derives a set of record files: the shared first half of `check`, `derive` and the
 * site build. Every file is checked even when others fail.
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
}

/** Loads, validates and derives one record file; engine diagnostics get file, line and column. */
export async function checkRecordFile(path: string, options: DeriveOptions = {}): Promise<CheckedRecord> {
  let loaded: LoadedRecord | undefined;
  try {
    loaded = await loadRecordFile(path);
    const base = { id: loaded.id, file: loaded.file, loaded };
    if (!loaded.record) return { ...base, diagnostics: placeDiagnostics(loaded, loaded.diagnostics) };
    const derived = deriveMechanism(loaded.record, options);
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

/** Checks files one after another (the engine is CPU-bound; order stays stable). */
export async function checkRecordFiles(
  paths: readonly string[],
  options: DeriveOptions = {},
): Promise<CheckedRecord[]> {
  const out: CheckedRecord[] = [];
  for (const p of paths) out.push(await checkRecordFile(p, options));
  return out;
}
