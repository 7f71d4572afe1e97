// /api/m/<id>.json: one record's derivation and checks (one entry of /api/mechanisms.json).
import type { GetStaticPaths } from 'astro';
import { atlasRecords } from '../../../components/content-entries.ts';
import { jsonResponse, publicReport, type RecordView } from '../../../site/index.ts';

export const getStaticPaths = (async () => {
  return (await atlasRecords()).map((view) => ({ params: { id: view.id }, props: { view } }));
}) satisfies GetStaticPaths;

/** The report of one record. */
export function GET({ props }: { props: { view: RecordView } }): Response {
  return jsonResponse(publicReport(props.view));
}
