/**
 * A system page's human side: the title, overall change and description from the system's own
 * record (content/systems/<system>.yaml), and that file's diagnostics. A system without a record,
 * or whose record has errors, is shown under its slug.
 */
import type { LoadedSystemRecord } from '../catalogue/index.ts';
import { diagnosticJson } from '../render/index.ts';
import type { SystemRecordView, SystemView } from './system-view.ts';

/** The system view with its record's title, overall change and description, where it has one. */
export function withSystemRecord(view: SystemView, records: readonly LoadedSystemRecord[]): SystemView {
  const loaded = records.find((r) => r.system === view.system);
  if (!loaded) return view;
  const record: SystemRecordView = { file: loaded.file, diagnostics: loaded.diagnostics.map(diagnosticJson) };
  if (loaded.record) {
    record.title = loaded.record.title;
    if (loaded.record.overall) record.overall = loaded.record.overall;
    if (loaded.record.description) record.description = loaded.record.description;
  }
  return { ...view, record };
}

/** The name a system is shown under: its record's title, or its slug. */
export function systemTitle(view: Pick<SystemView, 'system' | 'record'>): string {
  return view.record?.title ?? view.system;
}
