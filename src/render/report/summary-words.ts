/**
 * What a check found, said in plain words for the end of a report (and one line of it for the
 * build and a pull-request notification): whether anything blocks, what deserves a look, and how
 * the observed orders stand against the derived laws.
 */
import type { CatalogueReport, RecordReport } from '../../model/index.ts';
import { plural, severityCount, verdictCounts } from '../words/index.ts';

/** How many findings of each severity, and in how many records. */
export interface FindingCounts {
  records: number;
  clean: number;
  error: { findings: number; records: number };
  warning: { findings: number; records: number };
  info: { findings: number; records: number };
}

/** Counts the findings of each severity and the records that hold them. */
export function findingCounts(records: readonly Pick<RecordReport, 'diagnostics'>[]): FindingCounts {
  const tally = (severity: string) => {
    const per = records.map((r) => r.diagnostics.filter((d) => d.severity === severity).length);
    return { findings: per.reduce((a, b) => a + b, 0), records: per.filter((n) => n > 0).length };
  };
  return {
    records: records.length,
    clean: records.filter((r) => r.diagnostics.length === 0).length,
    error: tally('error'),
    warning: tally('warning'),
    info: tally('info'),
  };
}

/** "3 warnings in 1 record". */
function inRecords(count: { findings: number; records: number }, severity: string): string {
  return `${severityCount(count.findings, severity)} in ${plural(count.records, 'record')}`;
}

/** Whether anything blocks, in one clause: "nothing blocks" or "2 records have errors that block (5 in all)". */
export function blockingWords(counts: FindingCounts): string {
  const { error } = counts;
  if (error.records === 0) return 'nothing blocks';
  const have = error.records === 1 ? '1 record has' : `${error.records} records have`;
  return `${have} ${error.findings === 1 ? 'an error' : 'errors'} that block${error.findings === 1 ? 's' : ''}${error.findings > error.records ? ` (${error.findings} in all)` : ''}`;
}

/** The findings that do not block, in one clause: "3 warnings in 1 record, 8 notes in 5 records" (empty: none). */
export function otherFindingsWords(counts: FindingCounts): string {
  return (['warning', 'info'] as const)
    .filter((s) => counts[s].findings > 0)
    .map((s) => inRecords(counts[s], s))
    .join(', ');
}

/**
 * The summary on one line: "13 records checked: nothing blocks; 3 warnings in 1 record, 8 notes in
 * 5 records; observed orders: 31 consistent, 3 contradicted".
 */
export function summaryLine(report: CatalogueReport, checked = 'record'): string {
  const counts = findingCounts(report.records);
  const others = otherFindingsWords(counts);
  const orders = report.summary.observations && verdictCounts(report.summary.observations);
  return [
    `${plural(counts.records, checked)} checked: ${blockingWords(counts)}`,
    ...(others ? [others] : []),
    ...(orders ? [`observed orders: ${orders}`] : []),
  ].join('; ');
}

/** The summary as sentences, one a line, for the end of the text report. */
export function summarySentences(report: CatalogueReport): string[] {
  const counts = findingCounts(report.records);
  const { clean, records } = counts;
  const have = clean === 1 ? 'has' : 'have';
  const checked =
    clean === records
      ? `Checked ${plural(records, 'record')}: nothing to report.`
      : `Checked ${plural(records, 'record')}${clean > 0 ? `; ${clean} ${have} nothing to report` : ''}.`;
  const out = [checked];
  if (clean < records)
    out.push(
      counts.error.records === 0
        ? 'Nothing blocks: no record has an error.'
        : `${capital(blockingWords(counts))}: fix ${counts.error.findings === 1 ? 'it' : 'them'} first (exit status 1).`,
    );
  const { warning, info } = counts;
  if (warning.findings > 0)
    out.push(`${capital(inRecords(warning, 'warning'))} ${warning.findings === 1 ? 'deserves' : 'deserve'} a look.`);
  if (info.findings > 0)
    out.push(`${capital(inRecords(info, 'info'))} ${info.findings === 1 ? 'is' : 'are'} for information.`);
  const orders = report.summary.observations && verdictCounts(report.summary.observations);
  if (orders) out.push(`Observed orders against the derived laws: ${orders}.`);
  return out;
}

function capital(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
