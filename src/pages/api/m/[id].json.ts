// /api/m/<id>.json: one record's derivation and checks (one entry of /api/mechanisms.json).
import type { GetStaticPaths } from 'astro';
import { getCollection } from 'astro:content';
import { jsonResponse, publicReport } from '../../../site/api-report.ts';
import type { RecordView } from '../../../site/record-view.ts';

export const getStaticPaths = (async () => {
  const entries = await getCollection('mechanisms');
  return entries.map((e) => ({ params: { id: e.id }, props: { view: e.data as unknown as RecordView } }));
}) satisfies GetStaticPaths;

/** The report of one record. */
export function GET({ props }: { props: { view: RecordView } }): Response {
  return jsonResponse(publicReport(props.view));
}
