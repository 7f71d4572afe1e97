/** The whole JSON report: tool, summary and one entry per record. */
import { countBySeverity, type Diagnostic } from '../../model/diagnostic.ts';
import { recordReport, type RecordInput, type RecordReport } from './record-report.ts';

export interface CatalogueReport {
  tool: { name: 'mechatlas'; version: string };
  summary: { records: number; errors: number; warnings: number; notes: number };
  records: RecordReport[];
}

/** Builds the report of a set of checked records. */
export function catalogueReport(inputs: readonly RecordInput[], version: string): CatalogueReport {
  const all: Diagnostic[] = inputs.flatMap((r) => [...r.diagnostics]);
  const counts = countBySeverity(all);
  return {
    tool: { name: 'mechatlas', version },
    summary: { records: inputs.length, errors: counts.error, warnings: counts.warning, notes: counts.info },
    records: inputs.map(recordReport),
  };
}
