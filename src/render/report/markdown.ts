/**
 * The markdown review, for a pull-request comment: a first line a reviewer can read in a
 * notification (whether anything blocks, and what else there is), then one collapsible section
 * per record under review with its chemistry before → after, its verdicts and its findings.
 */
import type { CatalogueReport, RecordReport } from '../../model/index.ts';
import { plural, SEVERITIES } from '../words/index.ts';
import { cell, codeSpan } from './markdown-text.ts';
import { fitsSectionMarkdown } from './fits-section.ts';
import { recordSection, removedSection, type MarkdownSection } from './markdown-record.ts';
import { findingCounts, summaryLine } from './summary-words.ts';

/** GitHub keeps comments under 65,536 characters; past this many records the rest are only named. */
const MAX_SECTIONS = 60;

export interface MarkdownOptions {
  /**
   * the revision compared with, each changed record there by file (`null`: the change adds it),
   * and the records the change removes, as they stood there
   */
  base?: { ref: string; records: ReadonlyMap<string, RecordReport | null>; removed?: readonly RecordReport[] };
  sections?: readonly MarkdownSection[];
}

/** Renders the report as GitHub-flavoured markdown. */
export function markdownReport(report: CatalogueReport, options: MarkdownOptions = {}): string {
  const counts = findingCounts(report.records);
  const mark = counts.error.records > 0 ? '✗' : '✓';
  const out = [`**mechatlas review** — ${mark} ${summaryLine(report, options.base ? 'changed record' : 'record')}`];
  const removed = options.base?.removed ?? [];
  if (options.base) {
    const added = report.records.filter((r) => options.base!.records.get(r.file) === null).length;
    const gone = removed.length > 0 ? `; ${plural(removed.length, 'record')} removed` : '';
    out.push(
      '',
      `Compared with ${codeSpan(options.base.ref)}: ${plural(counts.records, 'record')} changed${added > 0 ? `, ${added} of them new` : ''}${gone}.`,
    );
  }
  // What blocks first, then what deserves a look; the file order otherwise.
  const ordered = [...report.records].sort((a, b) => urgency(a) - urgency(b));
  const shown = ordered.slice(0, MAX_SECTIONS);
  for (const r of shown) out.push('', ...recordSection(r, options.base?.records.get(r.file), options.sections));
  for (const r of removed) out.push('', ...removedSection(r));
  const left = ordered.slice(MAX_SECTIONS);
  if (left.length > 0)
    out.push('', `${plural(left.length, 'more record')} not shown: ${left.map((r) => codeSpan(r.file)).join(', ')}.`);
  out.push(...fitsSectionMarkdown(report, cell));
  out.push(
    '',
    '_Derived rate laws are models. Decisions on scale-up, thermal hazards or exposure rest with calorimetry, local codes and licensed practice._',
  );
  return out.join('\n') + '\n';
}

/** 0 for a record with an error, 1 with a warning, 2 with a note, 3 with no findings. */
function urgency(r: RecordReport): number {
  const i = SEVERITIES.findIndex((s) => r.diagnostics.some((d) => d.severity === s));
  return i < 0 ? SEVERITIES.length : i;
}
