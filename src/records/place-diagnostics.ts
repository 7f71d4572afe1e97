/**
 * The engine knows where a problem is only as a path into the record; this gives each diagnostic
 * its file, line and column. Diagnostics that already have a line keep it.
 */
import type { Diagnostic } from '../model/index.ts';
import type { LoadedRecord } from './load-record.ts';

/** Sets file, line, column, endLine and endColumn on each diagnostic from its path and offset. */
export function placeDiagnostics(
  loaded: Pick<LoadedRecord, 'file' | 'locate'>,
  diagnostics: readonly Diagnostic[],
): Diagnostic[] {
  return diagnostics.map((d) => {
    const placed: Diagnostic = { ...d, file: d.file ?? loaded.file };
    if (d.line !== undefined || d.path === undefined) return placed;
    const position = loaded.locate(d.path, d.offset);
    return position === undefined ? placed : { ...placed, ...position };
  });
}
