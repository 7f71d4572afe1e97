/**
 * An observation's data table as read from a record or a CSV file beside it: column names, unit
 * texts, numbers and where every cell is written. src/records reads it; the engine turns it into
 * quantities in canonical units (src/engine/fitting/read-kinetic-data.ts). Keeping the positions
 * on the table lets a problem found in either layer point at its cell.
 */
import type { DataKind } from './mechanism-record.ts';

/** Where something is written: a file and a 1-based line and column. */
export interface SourceSpot {
  file: string;
  line: number;
  column: number;
}

/** One column of a data table as read. */
export interface DataColumn {
  /** a species symbol, `rate`, `t`, `T`, `k`, `replicate` or `u(NAME)` */
  name: string;
  /** the unit as written in the header or the units map; undefined when none is given */
  unit?: string;
  /** the header cell */
  at: SourceSpot;
  /** where the unit is written (the header, or the entry of the units map) */
  unitAt?: SourceSpot;
  /** one value per row; undefined for an empty or unreadable cell (an unreadable one is already reported) */
  values: (number | undefined)[];
  /** each cell as text (the labels of a replicate column) */
  labels: string[];
  /** where each cell is written */
  cells: SourceSpot[];
}

/** The data table of one observation. */
export interface DataTable {
  /** the observation's id and its index in the record's observations */
  observation: string;
  observationIndex: number;
  kind: DataKind;
  /** the file the cells are in: the CSV file, or the record itself for an inline table */
  file: string;
  /** the observation's `data` field in the record */
  at: SourceSpot;
  columns: DataColumn[];
  /** the number of rows (measurements) */
  rows: number;
  /** for a temperature series: the rate constant the k column holds (k_obs when not given) */
  constant?: string;
}

/** The column names with a meaning of their own; any other name is a species symbol. */
export const DATA_COLUMN_NAMES = ['rate', 't', 'T', 'k', 'replicate'] as const;

/** The column an uncertainty column `u(NAME)` belongs to, or undefined for any other name. */
export function uncertaintyOf(name: string): string | undefined {
  const match = /^u\((.+)\)$/.exec(name);
  return match?.[1];
}
