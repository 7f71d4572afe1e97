/**
 * The data tables of a record's observations: inline tables read from the record, CSV files read
 * from beside it (inside the content folder), each built into a DataTable with every cell's place.
 * This is the only file of src/records that reads data files; the engine receives numbers.
 */
import { readFile } from 'node:fs/promises';
import {
  diagnostic,
  type DataTable,
  type Diagnostic,
  type ObservationData,
  type RecordPath,
  type SourceSpot,
} from '../model/index.ts';
import { buildDataTable, type RawCell, type RawTable } from './build-data-table.ts';
import type { LoadedRecord } from './load-record.ts';
import { parseDataCsv } from './parse-data-csv.ts';
import { resolveDataPath } from './resolve-data-path.ts';

/** Every table of the record's observations that could be read, and every problem found. */
export interface ObservationDataResult {
  tables: DataTable[];
  diagnostics: Diagnostic[];
}

/** Reads the data of each observation of a loaded record (nothing when the record did not load). */
export async function readObservationData(
  loaded: Pick<LoadedRecord, 'file' | 'record' | 'locate'>,
): Promise<ObservationDataResult> {
  const tables: DataTable[] = [];
  const diagnostics: Diagnostic[] = [];
  const observations = loaded.record?.observations ?? [];
  for (const [index, observation] of observations.entries()) {
    if (!observation.data) continue;
    const raw = await rawTable(loaded, index, observation.id, observation.data, diagnostics);
    if (!raw) continue;
    const built = buildDataTable(raw);
    diagnostics.push(...built.diagnostics);
    if (built.table) tables.push(built.table);
  }
  return { tables, diagnostics };
}

async function rawTable(
  loaded: Pick<LoadedRecord, 'file' | 'locate'>,
  index: number,
  id: string,
  data: ObservationData,
  diagnostics: Diagnostic[],
): Promise<RawTable | undefined> {
  const base: RecordPath = ['observations', index, 'data'];
  const spot = (path: RecordPath): SourceSpot => {
    const position = loaded.locate(path);
    return { file: loaded.file, line: position?.line ?? 1, column: position?.column ?? 1 };
  };
  const at = spot(base);
  const fail = (rule: 'data/columns' | 'data/path' | 'data/file', where: SourceSpot, message: string) => {
    diagnostics.push(diagnostic(rule, 'error', message, { ...where }));
    return undefined;
  };
  const inline = data.columns !== undefined || data.rows !== undefined;
  if (inline && data.file !== undefined)
    return fail('data/columns', at, 'give the table either inline (columns and rows) or as a file, not both');
  if (!inline && data.file === undefined)
    return fail('data/columns', at, 'give the table inline (columns and rows) or as a file');
  if (inline && (data.columns === undefined || data.rows === undefined))
    return fail('data/columns', at, 'an inline table needs both columns and rows');
  const units = Object.entries(data.units ?? {}).map(([name, unit]) => ({
    name,
    unit,
    at: spot([...base, 'units', name]),
  }));
  const common = {
    observation: id,
    observationIndex: index,
    kind: data.kind,
    at,
    units,
    ...(data.constant ? { constant: data.constant } : {}),
  };
  if (inline) {
    const header = data.columns!.map((value, j): RawCell => ({ value, at: spot([...base, 'columns', j]) }));
    const rows = data.rows!.map((row, r) =>
      row.map((value, j): RawCell => ({ value, at: spot([...base, 'rows', r, j]) })),
    );
    const rowAt = data.rows!.map((_, r) => spot([...base, 'rows', r]));
    return { ...common, file: loaded.file, header, rows, rowAt };
  }
  const resolved = await resolveDataPath(loaded.file, data.file!);
  if ('problem' in resolved) return fail('data/path', spot([...base, 'file']), resolved.problem);
  let bytes: Uint8Array;
  try {
    bytes = await readFile(resolved.path);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? 'unknown error';
    const why = code === 'ENOENT' ? 'does not exist' : `cannot be read (${code})`;
    return fail('data/file', spot([...base, 'file']), `the data file ${resolved.path} ${why}`);
  }
  const parsed = parseDataCsv(resolved.path, bytes);
  diagnostics.push(...parsed.diagnostics);
  if (parsed.diagnostics.length > 0) return undefined;
  const [header, ...rows] = parsed.rows.map((row) => row.map((cell): RawCell => ({ value: cell.text, at: cell.at })));
  if (!header)
    return fail('data/file', { file: resolved.path, line: 1, column: 1 }, 'the data file has no header line');
  return { ...common, file: resolved.path, header, rows, rowAt: rows.map((row) => row[0]!.at) };
}
