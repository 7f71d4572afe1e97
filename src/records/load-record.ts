/**
 * Loading one record: YAML with positions, then the schema, then the id from the file name.
 * A record is handed on only when all three succeed, so the engine may trust its shape.
 */
import { readFile } from 'node:fs/promises';
import { diagnostic } from '../model/index.ts';
import type { Diagnostic, RecordPath } from '../model/index.ts';
import type { MechanismRecord } from '../model/index.ts';
import { parseRecordYaml } from './parse-record-yaml.ts';
import { describeSchemaErrors } from './schema-messages.ts';
import { recordValidator } from './schema-validator.ts';
import type { RecordLocator, SourcePosition } from './source-positions.ts';
import { isRecordId, recordId, suggestRecordId } from './record-id.ts';

/** One record file as read: its id, text, diagnostics and, when valid, the typed record. */
export interface LoadedRecord {
  id: string;
  file: string;
  source: string;
  /** Set only when the YAML parsed, the schema validated and the id is valid. */
  record?: MechanismRecord;
  diagnostics: Diagnostic[];
  /** Where `path` is written (nearest existing ancestor); undefined when the file was unreadable. */
  locate(path: RecordPath, offset?: number): SourcePosition | undefined;
}

function schemaDiagnostics(data: unknown, locator: RecordLocator, file: string): Diagnostic[] {
  const validate = recordValidator();
  if (validate(data)) return [];
  const problems = describeSchemaErrors(validate.errors ?? [], data);
  const placed = problems.map((problem) => {
    const position = problem.at === 'key' ? locator.locateKey(problem.path) : locator.locate(problem.path);
    const extra = { path: problem.path, file, ...position };
    const withActual = problem.actual === undefined ? extra : { ...extra, actual: problem.actual };
    const full = problem.expected === undefined ? withActual : { ...withActual, expected: problem.expected };
    return diagnostic('record/schema', 'error', problem.message, full);
  });
  // ajv reports in schema order; a reader fixes a file from the top down.
  return placed.sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
}

function idDiagnostics(id: string, file: string): Diagnostic[] {
  if (isRecordId(id)) return [];
  const message = `the file name '${id}' cannot be a record id: use lower-case letters, digits and single hyphens`;
  const note = `rename the file to ${suggestRecordId(id)}.yaml`;
  return [diagnostic('record/schema', 'error', message, { file, line: 1, column: 1, note, actual: id })];
}

/** Loads a record from its text; pure (no file access), the id comes from `file`'s base name. */
export function loadRecordSource(file: string, source: string): LoadedRecord {
  const id = recordId(file);
  const parsed = parseRecordYaml(source);
  const diagnostics: Diagnostic[] = parsed.diagnostics.map((d) => ({ ...d, file }));
  if ('data' in parsed) diagnostics.push(...schemaDiagnostics(parsed.data, parsed.locator, file));
  diagnostics.push(...idDiagnostics(id, file));
  const locate = (path: RecordPath, offset?: number): SourcePosition => parsed.locator.locate(path, offset);
  const loaded: LoadedRecord = { id, file, source, diagnostics, locate };
  if (diagnostics.some((d) => d.severity === 'error')) return loaded;
  return { ...loaded, record: parsed.data as MechanismRecord };
}

/** Reads and loads a record file; a file that cannot be read gives a `record/yaml` diagnostic. */
export async function loadRecordFile(path: string): Promise<LoadedRecord> {
  let source: string;
  try {
    source = await readFile(path, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? 'unknown error';
    const message = `the file cannot be read (${code})`;
    const diagnostics = [diagnostic('record/yaml', 'error', message, { file: path })];
    return { id: recordId(path), file: path, source: '', diagnostics, locate: () => undefined };
  }
  return loadRecordSource(path, source);
}
