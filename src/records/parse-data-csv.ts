/**
 * A CSV data file parsed by csv-parse into cells that know their line and column. csv-parse
 * reports, for every field, how many bytes of the file it has consumed; that offset is turned into
 * a line and column here, so a bad cell can be pointed at. Lines starting with # are comments
 * (where a file says it holds invented data); blank lines are skipped.
 */
import { parse } from 'csv-parse/sync';
import { diagnostic, type Diagnostic, type SourceSpot } from '../model/index.ts';

/** One cell of the file: its text (trimmed) and where it starts. */
export interface CsvCell {
  text: string;
  at: SourceSpot;
}

interface Field {
  value: string;
  end: number;
  index: number;
}

const FRIENDLY: Record<string, string> = {
  CSV_QUOTE_NOT_CLOSED: 'a quote is never closed: the file ends inside quotes',
  CSV_INVALID_CLOSING_QUOTE: 'a quote closes in the middle of a cell; put the whole cell in quotes',
  CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE: 'text follows a closing quote in the same cell',
};

/** Parses the bytes of a CSV file into rows of cells; CSV errors become `data/file` diagnostics at their line. */
export function parseDataCsv(file: string, bytes: Uint8Array): { rows: CsvCell[][]; diagnostics: Diagnostic[] } {
  const data = hasByteOrderMark(bytes) ? bytes.subarray(3) : bytes;
  const lineStarts = [0];
  data.forEach((b, i) => {
    if (b === 0x0a) lineStarts.push(i + 1);
  });
  let records: Field[][];
  try {
    records = parse(Buffer.from(data), {
      comment: '#',
      comment_no_infix: true,
      skip_empty_lines: true,
      relax_column_count: true,
      trim: true,
      cast: (value: string, context: { bytes: number; index: number }) => ({
        value,
        end: context.bytes,
        index: context.index,
      }),
    }) as unknown as Field[][];
  } catch (error) {
    const e = error as { code?: string; lines?: number; message?: string };
    const message = FRIENDLY[e.code ?? ''] ?? `the file is not valid CSV: ${e.message ?? String(error)}`;
    return {
      rows: [],
      diagnostics: [diagnostic('data/file', 'error', message, { file, line: e.lines ?? 1, column: 1 })],
    };
  }
  const locate = (offset: number): SourceSpot => {
    const line = lineIndexOf(lineStarts, offset);
    const column = Buffer.from(data.subarray(lineStarts[line]!, offset)).toString('utf8').length + 1;
    return { file, line: line + 1, column };
  };
  const rows = records.map((record) => {
    let start = 0;
    return record.map((field, index): CsvCell => {
      // A record starts a line; each later field starts one past the end of the one before.
      // (A first cell that holds a quoted line break is placed on its last line.)
      if (index === 0) start = lineStarts[lineIndexOf(lineStarts, field.end)]!;
      let from = start;
      while (from < field.end && (data[from] === 0x20 || data[from] === 0x09)) from++;
      const cell = { text: field.value, at: locate(from) };
      start = field.end + 1;
      return cell;
    });
  });
  return { rows, diagnostics: [] };
}

/** The index of the line holding a byte offset (binary search over the line starts). */
function lineIndexOf(lineStarts: readonly number[], offset: number): number {
  let low = 0;
  let high = lineStarts.length - 1;
  while (low < high) {
    const mid = (low + high + 1) >> 1;
    if (lineStarts[mid]! <= offset) low = mid;
    else high = mid - 1;
  }
  return low;
}

function hasByteOrderMark(bytes: Uint8Array): boolean {
  return bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf;
}
