/**
 * The text report, for a chemist at a terminal: each record with findings under its title and
 * file, its findings beneath in order of position, then a summary in plain words. A record's
 * block is a list of sections, one per concern, so a new concern adds a section.
 */
import type { CatalogueReport, RecordReport } from '../../model/index.ts';
import { escapeControlCharacters as printable } from './control-characters.ts';
import { byPosition, findingLines } from './finding-text.ts';
import { summarySentences } from './summary-words.ts';
import { fitsSectionText } from './fits-section.ts';

/** One concern of a record's block: its lines, or none when it has nothing to say. */
export type TextSection = (record: RecordReport) => string[];

/** The findings of a record, in order of file, line and column. */
export const findingsSection: TextSection = (record) =>
  [...record.diagnostics].sort(byPosition).flatMap((d) => findingLines(d, record.file));

/** The sections of a record's block, in order. */
export const RECORD_SECTIONS: readonly TextSection[] = [findingsSection];

/** Renders the report for a terminal. */
export function textReport(report: CatalogueReport, sections: readonly TextSection[] = RECORD_SECTIONS): string {
  const blocks = report.records.flatMap((r) => {
    const body = sections.map((section) => section(r)).filter((lines) => lines.length > 0);
    return body.length > 0 ? [[...recordHeading(r), ...body.flatMap((lines) => ['', ...lines])]] : [];
  });
  const lines = blocks.flatMap((block) => [...block, '']);
  const fits = fitsSectionText(report).map((l) => printable(l));
  if (fits.length > 0) lines.push(...fits, '');
  lines.push(...summarySentences(report));
  return lines.join('\n') + '\n';
}

/** The record's title (its id where it has none) and, beneath, its file. */
export function recordHeading(record: Pick<RecordReport, 'id' | 'title' | 'file'>): string[] {
  const title = printable(record.title ?? record.id);
  return [`■ ${title}`, `  ${printable(record.file)}`];
}
