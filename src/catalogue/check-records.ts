/**
 * Loads and derives a set of record files: the shared first half of `check`, `derive` and the
 * site build. Every file is checked even when others fail.
 */
import { deriveMechanism, type Derivation, type DeriveOptions } from '../engine/index.ts';
import type { Diagnostic, MechanismRecord } from '../model/index.ts';
import { loadRecordFile, placeDiagnostics, type LoadedRecord } from '../records/index.ts';

/** One record file as checked: what was loaded, the record where it is valid, its derivation and every diagnostic placed. */
export interface CheckedRecord {
  id: string;
  file: string;
  loaded: LoadedRecord;
  record?: MechanismRecord;
  derivation?: Derivation;
  /** every diagnostic of the record, with file, line and column */
  diagnostics: Diagnostic[];
}

/** Loads, validates and derives one record file; engine diagnostics get file, line and column. */
export async function checkRecordFile(path: string, options: DeriveOptions = {}): Promise<CheckedRecord> {
  const loaded = await loadRecordFile(path);
  const base = { id: loaded.id, file: loaded.file, loaded };
  if (!loaded.record) return { ...base, diagnostics: placeDiagnostics(loaded, loaded.diagnostics) };
  const derivation = deriveMechanism(loaded.record, options);
  const diagnostics = placeDiagnostics(loaded, [...loaded.diagnostics, ...derivation.diagnostics]);
  return { ...base, record: loaded.record, derivation, diagnostics };
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
