/**
 * The rivals of each reaction system among a set of checked records fitted to each other's data
 * (engine: fitSystem), with the ranking's findings placed on each rival's record. Used by `check`
 * on the records it was given and by the catalogue on the whole folder.
 */
import { fitSystem, type SystemDataSet, type SystemRival } from '../engine/index.ts';
import { dirname, resolve } from 'node:path';
import { findRecordFiles, loadRecordFile, placeDiagnostics } from '../records/index.ts';
import { checkRecordFile, type CheckedRecord } from './check-records.ts';

/** A checked record with the fits of its system's data sets. */
export type FittedRecord<T extends CheckedRecord = CheckedRecord> = T & {
  /** every data set of the record's system, each rival fitted to it and ranked */
  systemFits?: SystemDataSet[];
};

/** The records with their systems fitted; records without data in their system come back as they were. */
export function withSystemFits<T extends CheckedRecord>(records: readonly T[]): FittedRecord<T>[] {
  const bySystem = new Map<string, T[]>();
  for (const r of records) if (r.record) bySystem.set(r.record.system, [...(bySystem.get(r.record.system) ?? []), r]);
  const fitted = new Map<T, FittedRecord<T>>();
  for (const members of bySystem.values()) {
    const rivals: SystemRival[] = members
      .filter((r) => r.record && r.derivation && !r.diagnostics.some((d) => d.severity === 'error'))
      .map((r) => ({
        id: r.id,
        status: r.record!.status,
        record: r.record!,
        derivation: r.derivation!,
        data: r.data ?? [],
      }));
    if (!rivals.some((r) => r.data.length > 0)) continue;
    const fits = fitSystem(rivals);
    if (fits.dataSets.length === 0) continue;
    for (const r of members) {
      const found = fits.diagnostics.get(r.id) ?? [];
      const placed = found.length > 0 ? placeDiagnostics(r.loaded, found) : [];
      fitted.set(r, { ...r, systemFits: fits.dataSets, diagnostics: [...r.diagnostics, ...placed] });
    }
  }
  return records.map((r) => fitted.get(r) ?? r);
}

/**
 * One record file checked with the rivals of its system found beside it (the records of the same
 * folder that name the same system), all fitted together; the record itself comes first.
 */
export async function checkWithRivals(file: string): Promise<FittedRecord[]> {
  const checked = await checkRecordFile(file);
  const system = checked.record?.system;
  if (!system) return withSystemFits([checked]);
  const { files } = await findRecordFiles([dirname(file)]);
  const rivals: CheckedRecord[] = [];
  for (const other of files) {
    if (resolve(other) === resolve(file)) continue;
    // Reading the YAML alone tells the system; only rivals are derived.
    const loaded = await loadRecordFile(other);
    if (loaded.record?.system === system) rivals.push(await checkRecordFile(other));
  }
  return withSystemFits([checked, ...rivals]);
}
