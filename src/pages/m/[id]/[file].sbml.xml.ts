// /m/<id>/<id>.sbml.xml: the record's mass-action model as SBML Level 3 Version 2, from the engine.
import type { GetStaticPaths } from 'astro';
import { atlasRecords } from '../../../components/content-entries.ts';

export const getStaticPaths = (async () => {
  return (await atlasRecords())
    .filter((view) => view.sbml)
    .map((view) => ({ params: { id: view.id, file: view.id }, props: { sbml: view.sbml! } }));
}) satisfies GetStaticPaths;

/** The SBML document. */
export function GET({ props }: { props: { sbml: string } }): Response {
  return new Response(props.sbml, { headers: { 'Content-Type': 'application/sbml+xml; charset=utf-8' } });
}
