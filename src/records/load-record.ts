/**
 * Loading one record: YAML with positions, then the schema, then the id from the file name.
 * A record is handed on only when all three succeed, so the engine may trust its shape.
 */
import { diagnostic } from '../model/index.ts';
import type { Diagnostic, RecordPath } from '../model/index.ts';
import type { MechanismRecord } from '../model/index.ts';
import { parseRecordYaml } from './parse-record-yaml.ts';
import { describeSchemaErrors } from './schema-messages.ts';
import { recordValidator } from './schema-validator.ts';
import type { RecordLocator, SourcePosition } from './source-positions.ts';
import { readRecordText } from './read-record-text.ts';
import { duplicateIdDiagnostics, recordIdDiagnostics } from './record-file-problems.ts';
import { recordId } from './record-id.ts';

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

/** Loads a record from its text; pure (no file access), the id comes from `file`'s base name. */
export function loadRecordSource(file: string, source: string): LoadedRecord {
  const id = recordId(file);
  const parsed = parseRecordYaml(source);
  const diagnostics: Diagnostic[] = parsed.diagnostics.map((d) => ({ ...d, file }));
  if ('data' in parsed) diagnostics.push(...schemaDiagnostics(parsed.data, parsed.locator, file));
  diagnostics.push(...recordIdDiagnostics(file));
  const locate = (path: RecordPath, offset?: number): SourcePosition => parsed.locator.locate(path, offset);
  const loaded: LoadedRecord = { id, file, source, diagnostics, locate };
  if (diagnostics.some((d) => d.severity === 'error')) return loaded;
  return { ...loaded, record: parsed.data as MechanismRecord };
}

/**
 * Reads and loads a record file: a regular UTF-8 file of a sane size (else a `record/file` error),
 * whose name gives an id no other file in its folder gives (else `record/duplicate-id`); a file
 * that cannot be opened gives a `record/yaml` diagnostic.
 */
export async function loadRecordFile(path: string): Promise<LoadedRecord> {
  const read = await readRecordText(path);
  if ('problem' in read) {
    const diagnostics = [read.problem, ...recordIdDiagnostics(path)];
    return { id: recordId(path), file: path, source: '', diagnostics, locate: () => undefined };
  }
  const loaded = loadRecordSource(path, read.text);
  const duplicates = await duplicateIdDiagnostics(path);
  if (duplicates.length === 0) return loaded;
  const { record: _valid, ...rest } = loaded;
  return { ...rest, diagnostics: [...loaded.diagnostics, ...duplicates] };
}
