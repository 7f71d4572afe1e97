/**
 * Problems with a record's file name, found without reading the record: a name that cannot be a
 * record id (empty, unsafe, too long), and a second file in the same folder that gives the same
 * id (`x.yaml` beside `x.yml`), whose pages would overwrite each other. Such records are checked
 * and reported, but never published as pages.
 */
import { readdir, stat } from 'node:fs/promises';
import { basename, dirname } from 'node:path';
import { diagnostic, type Diagnostic } from '../model/index.ts';
import { recordId, recordIdProblem, suggestRecordId } from './record-id.ts';

const RECORD_FILE = /\.ya?ml$/i;

// Folder listings by folder and modification time: a catalogue check asks once per record.
const listings = new Map<string, { changed: number; names: string[] }>();

async function recordNames(folder: string): Promise<string[]> {
  const changed = (await stat(folder)).mtimeMs;
  const known = listings.get(folder);
  if (known?.changed === changed) return known.names;
  const names = (await readdir(folder)).filter((name) => RECORD_FILE.test(name));
  listings.set(folder, { changed, names });
  return names;
}

/** A `record/schema` error at line 1 when the file name cannot be a record id. */
export function recordIdDiagnostics(file: string): Diagnostic[] {
  const id = recordId(file);
  const problem = recordIdProblem(id);
  if (problem === undefined) return [];
  const note = `rename the file to ${suggestRecordId(id)}.yaml`;
  return [diagnostic('record/schema', 'error', problem, { file, line: 1, column: 1, note, actual: id })];
}

/** `record/duplicate-id` errors naming every other file in the folder that gives the same id. */
export async function duplicateIdDiagnostics(file: string): Promise<Diagnostic[]> {
  const id = recordId(file);
  const names = await recordNames(dirname(file)).catch(() => []);
  const others = names.filter((name) => name !== basename(file) && recordId(name) === id).sort();
  if (others.length === 0) return [];
  const message = `${basename(file)} and ${others.join(' and ')} both give the record id '${id}'; neither is published`;
  const note = 'rename or remove one of them: the file name is the id';
  return [diagnostic('record/duplicate-id', 'error', message, { file, line: 1, column: 1, note, actual: others })];
}

/** Every file-name problem of a record file: an id that cannot be one, and ids given twice. */
export async function recordFileProblems(file: string): Promise<Diagnostic[]> {
  return [...recordIdDiagnostics(file), ...(await duplicateIdDiagnostics(file))];
}

/** True when a record's id can be a page of the site: no file-name problem among its diagnostics. */
export function isPublishable(record: { id: string; diagnostics: readonly Diagnostic[] }): boolean {
  return recordIdProblem(record.id) === undefined && !record.diagnostics.some((d) => d.rule === 'record/duplicate-id');
}
