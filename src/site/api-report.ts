/**
 * The static JSON API's documents, in the shape of `mechatlas check --format json` (DESIGN.md
 * "Contracts"): the engine's report of each record, with file paths relative to the repository
 * as the CLI prints them, never the build machine's absolute paths.
 */
import type { CatalogueReport } from '../render/report/catalogue-report.ts';
import type { RecordReport } from '../render/report/record-report.ts';
import { toolVersion } from '../catalogue/tool-version.ts';
import type { RecordView } from './record-view.ts';

/** The report of one record with its file given as the catalogue names it. */
export function publicReport(view: RecordView): RecordReport {
  const { report } = view;
  return { ...report, file: view.file, diagnostics: report.diagnostics.map((d) => (d.file === undefined ? d : { ...d, file: view.file })) };
}

/** The whole catalogue's report: tool, summary and one entry per record. */
export function catalogueJson(views: readonly RecordView[]): CatalogueReport {
  const all = views.flatMap((v) => v.report.diagnostics);
  const count = (severity: string) => all.filter((d) => d.severity === severity).length;
  return {
    tool: { name: 'mechatlas', version: toolVersion() },
    summary: { records: views.length, errors: count('error'), warnings: count('warning'), notes: count('info') },
    records: views.map(publicReport),
  };
}

/** A JSON response body, pretty-printed (the files are meant to be read as well as fetched). */
export function jsonResponse(value: unknown): Response {
  return new Response(`${JSON.stringify(value, null, 2)}\n`, { headers: { 'Content-Type': 'application/json; charset=utf-8' } });
}
