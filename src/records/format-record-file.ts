/**
 * One record file formatted: read as every record is read (a regular UTF-8 file of at most
 * 1 MiB), then formatted in memory. Writing is the caller's choice (`fmt` writes, `fmt --check`
 * only compares), and happens only where there is a formatted text.
 */
import { formatRecordText } from './format-record.ts';
import { readRecordText } from './read-record-text.ts';
import type { Diagnostic } from '../model/index.ts';

/** A record file as formatting sees it: its text as read, the formatted text, or why there is none. */
export interface FormattedRecordFile {
  file: string;
  /** the text as read (absent when the file could not be read) */
  source?: string;
  /** the formatted text (absent when the file could not be read, parsed or formatted safely) */
  text?: string;
  diagnostics: Diagnostic[];
}

/** Reads and formats one record file, writing nothing. */
export async function formatRecordFile(file: string): Promise<FormattedRecordFile> {
  const read = await readRecordText(file);
  if ('problem' in read) return { file, diagnostics: [{ ...read.problem, file }] };
  const formatted = formatRecordText(read.text, file);
  return {
    file,
    source: read.text,
    ...(formatted.text !== undefined && { text: formatted.text }),
    diagnostics: formatted.diagnostics,
  };
}
