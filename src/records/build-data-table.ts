/**
 * A data table built from its cells, wherever they came from (inline in the record or from a CSV
 * file): the header read, the columns checked against the kind, the units found, every cell read
 * as a number, and the values checked against the range their quantity allows. Each problem is a
 * diagnostic at its cell.
 */
import {
  diagnostic,
  uncertaintyOf,
  type DataColumn,
  type DataKind,
  type DataTable,
  type Diagnostic,
  type SourceSpot,
} from '../model/index.ts';
import { cellNumber, readDataHeader } from './read-data-header.ts';
import { columnMisfit, columnRole, missingColumns, needsUnit } from './data-kind-columns.ts';
import { rangeProblem } from './data-value-range.ts';

/** One cell as written: a YAML value or CSV text, and where it is. */
export interface RawCell {
  value: unknown;
  at: SourceSpot;
}

/** The cells of one observation's table before they are read. */
export interface RawTable {
  observation: string;
  observationIndex: number;
  kind: DataKind;
  file: string;
  at: SourceSpot;
  header: readonly RawCell[];
  rows: readonly (readonly RawCell[])[];
  /** where each row starts */
  rowAt: readonly SourceSpot[];
  /** the record's units map, by column name */
  units: readonly { name: string; unit: string; at: SourceSpot }[];
  constant?: string;
}

const place = (at: SourceSpot) => ({ file: at.file, line: at.line, column: at.column });

/** Reads and checks a table; the table is returned only when nothing in it is an error. */
export function buildDataTable(raw: RawTable): { table?: DataTable; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const problem = (
    rule: Parameters<typeof diagnostic>[0],
    at: SourceSpot,
    message: string,
    severity: 'error' | 'warning' = 'error',
  ) => diagnostics.push(diagnostic(rule, severity, message, place(at)));
  const columns: DataColumn[] = [];
  for (const cell of raw.header) {
    const header = readDataHeader(String(cell.value ?? ''));
    if ('problem' in header) {
      problem('data/columns', cell.at, header.problem);
      continue;
    }
    if (columns.some((c) => c.name === header.name)) {
      problem('data/columns', cell.at, `the column '${header.name}' appears twice`);
      continue;
    }
    const column: DataColumn = { name: header.name, at: cell.at, values: [], labels: [], cells: [] };
    if (header.unit !== undefined) Object.assign(column, { unit: header.unit, unitAt: cell.at });
    columns.push(column);
  }
  const names = columns.map((c) => c.name);
  for (const c of columns) {
    const misfit = columnMisfit(raw.kind, c.name, names);
    if (misfit) problem('data/columns', c.at, misfit);
  }
  for (const missing of missingColumns(raw.kind, names)) problem('data/columns', raw.header[0]?.at ?? raw.at, missing);
  applyUnits(raw, columns, problem);
  raw.rows.forEach((row, r) => {
    if (row.length !== raw.header.length)
      problem(
        'data/columns',
        raw.rowAt[r] ?? raw.at,
        `this row has ${row.length} cells; the header has ${raw.header.length}`,
      );
    columns.forEach((column) => {
      const index = raw.header.findIndex((h) => h.at === column.at);
      const cell = row[index];
      column.cells.push(cell?.at ?? raw.rowAt[r] ?? raw.at);
      column.labels.push(cell?.value === null || cell?.value === undefined ? '' : String(cell.value));
      column.values.push(readCell(raw.kind, column.name, cell, problem));
    });
  });
  for (const column of columns)
    column.values.forEach((v, r) => {
      const why = v === undefined ? undefined : rangeProblem(raw.kind, columnRole(column.name), column.name, v);
      if (why) problem('data/range', column.cells[r]!, why);
    });
  if (diagnostics.some((d) => d.severity === 'error')) return { diagnostics };
  const { observation, observationIndex, kind, file, at } = raw;
  const table: DataTable = { observation, observationIndex, kind, file, at, columns, rows: raw.rows.length };
  if (kind === 'temperature_series') table.constant = raw.constant ?? 'k_obs';
  return { table, diagnostics };
}

type Report = (
  rule: Parameters<typeof diagnostic>[0],
  at: SourceSpot,
  message: string,
  severity?: 'error' | 'warning',
) => void;

function applyUnits(raw: RawTable, columns: DataColumn[], problem: Report): void {
  for (const entry of raw.units) {
    const column = columns.find((c) => c.name === entry.name);
    if (!column)
      problem('data/columns', entry.at, `units names '${entry.name}', which is not a column of this table`, 'warning');
    else if (column.unit !== undefined && column.unit !== entry.unit)
      problem(
        'data/units',
        entry.at,
        `the unit of '${entry.name}' is given twice: '${column.unit}' in its header and '${entry.unit}' here`,
      );
    else if (column.unit === undefined) Object.assign(column, { unit: entry.unit, unitAt: entry.at });
  }
  for (const column of columns) {
    const of = uncertaintyOf(column.name);
    const parent = of === undefined ? undefined : columns.find((c) => c.name === of);
    // An uncertainty is in the unit of its value unless it says otherwise.
    if (column.unit === undefined && parent?.unit !== undefined)
      Object.assign(column, { unit: parent.unit, unitAt: parent.unitAt });
    if (column.unit === undefined && needsUnit(column.name) && !(of !== undefined && parent === undefined))
      problem(
        'data/units',
        column.at,
        `the column '${column.name}' has no unit: write '${column.name} / unit' in the header or give it under units`,
      );
  }
}

function readCell(kind: DataKind, name: string, cell: RawCell | undefined, problem: Report): number | undefined {
  if (cell === undefined || columnRole(name) === 'replicate') return undefined;
  const empty = cell.value === null || (typeof cell.value === 'string' && cell.value.trim() === '');
  if (empty) {
    const optional = kind === 'time_course' && (columnRole(name) === 'species' || columnRole(name) === 'uncertainty');
    if (!optional)
      problem(
        'data/cell',
        cell.at,
        `the cell of '${name}' is empty; only a concentration in a time course may be left out`,
      );
    return undefined;
  }
  const x = cellNumber(cell.value);
  if (x === undefined) problem('data/cell', cell.at, `'${String(cell.value)}' in column '${name}' is not a number`);
  return x;
}
