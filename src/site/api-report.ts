/**
 * The static JSON API's documents, in the shape of `mechatlas check --format json` (DESIGN.md
 * "Contracts"): each record's report with its file named as the catalogue names it (relative to
 * the repository), never by the build machine's absolute path.
 */
import { toolVersion } from '../catalogue/index.ts';
import type { CatalogueReport, RecordReport } from '../model/index.ts';
import { reportOf } from '../render/index.ts';
import type { RecordView } from './record-view.ts';

/** The report of one record. */
export function publicReport(view: RecordView): RecordReport {
  return view.report;
}

/** The whole catalogue's report: tool, summary and one entry per record. */
export function catalogueJson(views: readonly RecordView[]): CatalogueReport {
  return reportOf(views.map(publicReport), toolVersion());
}

/** A JSON response body, pretty-printed (the files are meant to be read as well as fetched). */
export function jsonResponse(value: unknown): Response {
  return new Response(`${JSON.stringify(value, null, 2)}\n`, {
    headers: { 'Content-Type': 'application/json; charset=utf-8' },
  });
}
