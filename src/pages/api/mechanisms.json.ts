// /api/mechanisms.json: every record's derivation and checks, as `mechatlas check --format json` prints them.
import { getCollection } from 'astro:content';
import { catalogueJson, jsonResponse } from '../../site/api-report.ts';
import type { RecordView } from '../../site/record-view.ts';

/** The catalogue report. */
export async function GET(): Promise<Response> {
  const entries = await getCollection('mechanisms');
  const views = entries.map((e) => e.data as unknown as RecordView).sort((a, b) => a.id.localeCompare(b.id));
  return jsonResponse(catalogueJson(views));
}
