// /m/<id>/<id>.sbml.xml: the record's mass-action model as SBML Level 3 Version 2, from the engine.
import type { GetStaticPaths } from 'astro';
import { getCollection } from 'astro:content';
import type { RecordView } from '../../../site/record-view.ts';

export const getStaticPaths = (async () => {
  const entries = await getCollection('mechanisms');
  return entries
    .map((e) => e.data as unknown as RecordView)
    .filter((view) => view.sbml)
    .map((view) => ({ params: { id: view.id, file: view.id }, props: { sbml: view.sbml! } }));
}) satisfies GetStaticPaths;

/** The SBML document. */
export function GET({ props }: { props: { sbml: string } }): Response {
  return new Response(props.sbml, { headers: { 'Content-Type': 'application/sbml+xml; charset=utf-8' } });
}
