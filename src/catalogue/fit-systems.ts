/**
 * The rivals of each reaction system among a set of checked records fitted to each other's data
 * (engine: fitSystem), with the ranking's findings placed on each rival's record. Used by `check`
 * on the records it was given and by the catalogue on the whole folder.
 */
import { fitSystem, type SystemDataSet, type SystemRival } from '../engine/index.ts';
import { placeDiagnostics } from '../records/index.ts';
import type { CheckedRecord } from './check-records.ts';

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
