// /m/<id>/<id>.yaml: the record's source text exactly as it is in the repository.
import type { GetStaticPaths } from 'astro';
import { atlasRecords } from '../../../components/content-entries.ts';

export const getStaticPaths = (async () => {
  return (await atlasRecords()).map((view) => ({
    params: { id: view.id, file: view.id },
    props: { source: view.source },
  }));
}) satisfies GetStaticPaths;

/** The YAML source. */
export function GET({ props }: { props: { source: string } }): Response {
  return new Response(props.source, { headers: { 'Content-Type': 'text/yaml; charset=utf-8' } });
}
