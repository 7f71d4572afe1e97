/** The text reporter: one row per diagnostic, sorted by file, line and column, then a summary line. */
import type { CatalogueReport } from '../../model/index.ts';
import type { DiagnosticJson } from '../../model/index.ts';
import { escapeControlCharacters as printable } from './control-characters.ts';
import { verdictCounts } from '../words/index.ts';
import { fitsSectionText } from './fits-section.ts';

/** Renders the report for a terminal. */
export function textReport(report: CatalogueReport): string {
  const rows = report.records.flatMap((r) => r.diagnostics.map((d) => ({ ...d, file: d.file ?? r.file })));
  rows.sort(byPosition);
  const lines = rows.flatMap((d) => [diagnosticRow(d), ...(d.note ? [`    how to fix: ${printable(d.note)}`] : [])]);
  lines.push(...fitsSectionText(report).map((l) => printable(l)));
  lines.push(summaryLine(report));
  return lines.join('\n') + '\n';
}

/** One row: `file:line:column  severity  message  rule`, control characters shown as escapes. */
export function diagnosticRow(d: DiagnosticJson): string {
  return [`${printable(d.file ?? '')}:${d.line ?? 1}:${d.column ?? 1}`, d.severity, printable(d.message), d.rule].join(
    '  ',
  );
}

/** "12 records checked: 1 error, 2 warnings, 3 notes; observed orders: 4 consistent, 1 not excluded". */
export function summaryLine(report: CatalogueReport): string {
  const { records, errors, warnings, notes, observations } = report.summary;
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  const orders = observations && verdictCounts(observations);
  return `${plural(records, 'record')} checked: ${plural(errors, 'error')}, ${plural(warnings, 'warning')}, ${plural(notes, 'note')}${orders ? `; observed orders: ${orders}` : ''}`;
}

/** Orders diagnostics by file, then line, then column. */
export function byPosition(a: DiagnosticJson, b: DiagnosticJson): number {
  return (
    (a.file ?? '').localeCompare(b.file ?? '') || (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0)
  );
}
