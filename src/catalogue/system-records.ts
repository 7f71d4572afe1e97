/**
 * The system records beside a folder of mechanism records: `<content>/systems/*.yaml` for
 * `<content>/mechanisms/`. Optional — a catalogue without the folder has none — and each file
 * read once; a file with problems keeps its diagnostics and gives no title.
 */
import { stat } from 'node:fs/promises';
import { dirname, join, relative, resolve } from 'node:path';
import { findRecordFiles, loadSystemFile, type LoadedSystemRecord } from '../records/index.ts';

/** The folder of system records for a folder of mechanism records. */
export function systemFolderOf(mechanismFolder: string): string {
  return join(dirname(resolve(mechanismFolder)), 'systems');
}

/** Every system record beside the mechanism folder, files named relative to the working folder. */
export async function loadSystemRecords(mechanismFolder: string): Promise<LoadedSystemRecord[]> {
  const folder = systemFolderOf(mechanismFolder);
  const exists = await stat(folder).then(
    (s) => s.isDirectory(),
    () => false,
  );
  if (!exists) return [];
  const { files } = await findRecordFiles([folder]);
  const cwd = process.env['MECHATLAS_CWD'] ?? process.cwd();
  const loaded = await Promise.all(files.map(loadSystemFile));
  return loaded.map((s) => {
    const file = relative(cwd, s.file) || s.file;
    return { ...s, file, diagnostics: s.diagnostics.map((d) => ({ ...d, file })) };
  });
}
