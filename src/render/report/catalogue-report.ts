/** The whole JSON report: tool, summary and one entry per record. */
import { countBySeverity, type CatalogueReport, type RecordReport } from '../../model/index.ts';
import { recordReport, type RecordInput } from './record-report.ts';
import { primaryChecks, tallyVerdicts } from './verdict-tally.ts';

/** Builds the report of a set of checked records. */
export function catalogueReport(inputs: readonly RecordInput[], version: string): CatalogueReport {
  return reportOf(inputs.map(recordReport), version);
}

/** The report around record entries already built (the site's, whose files are named as the catalogue names them). */
export function reportOf(records: readonly RecordReport[], version: string): CatalogueReport {
  const counts = countBySeverity(records.flatMap((r) => r.diagnostics));
  return {
    tool: { name: 'mechatlas', version },
    summary: {
      records: records.length,
      errors: counts.error,
      warnings: counts.warning,
      notes: counts.info,
      observations: tallyVerdicts(records.flatMap(primaryChecks)),
    },
    records: [...records],
  };
}
