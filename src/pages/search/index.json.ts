// The prebuilt search bundle (documents and Fuse indexes), written once at build time.
import { getCollection } from 'astro:content';
import { buildSearchIndex, type MechanismInput, type SpeciesInput } from '../../search/build-index.ts';

/** The bundle as JSON, for the search page to fetch. */
export async function GET(): Promise<Response> {
  const byId = (a: { id: string }, b: { id: string }) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
  const mechanisms = (await getCollection('mechanisms')).sort(byId).map((e) => e.data as unknown as MechanismInput);
  const species = (await getCollection('species')).sort(byId).map((e) => e.data as unknown as SpeciesInput);
  return new Response(JSON.stringify(buildSearchIndex(mechanisms, species)), { headers: { 'Content-Type': 'application/json; charset=utf-8' } });
}
