/**
 * Loads and derives a set of record files: the shared first half of `check`, `derive` and the
 * site build. Every file is checked even when others fail.
 */
import { deriveMechanism, type Derivation, type DeriveOptions } from '../engine/derive.ts';
import type { Diagnostic } from '../model/diagnostic.ts';
import { loadRecordFile, placeDiagnostics, type LoadedRecord } from '../records/index.ts';
import type { RecordInput } from '../render/report/record-report.ts';

export interface CheckedRecord extends RecordInput {
  loaded: LoadedRecord;
  derivation?: Derivation;
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
export async function checkRecordFiles(paths: readonly string[], options: DeriveOptions = {}): Promise<CheckedRecord[]> {
  const out: CheckedRecord[] = [];
  for (const p of paths) out.push(await checkRecordFile(p, options));
  return out;
}
