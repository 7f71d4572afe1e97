// /m/<id>/<id>.yaml: the record's source text exactly as it is in the repository.
import type { GetStaticPaths } from 'astro';
import { getCollection } from 'astro:content';
import type { RecordView } from '../../../site/record-view.ts';

export const getStaticPaths = (async () => {
  const entries = await getCollection('mechanisms');
  return entries.map((e) => ({ params: { id: e.id, file: e.id }, props: { source: (e.data as unknown as RecordView).source } }));
}) satisfies GetStaticPaths;

/** The YAML source. */
export function GET({ props }: { props: { source: string } }): Response {
  return new Response(props.source, { headers: { 'Content-Type': 'text/yaml; charset=utf-8' } });
}
