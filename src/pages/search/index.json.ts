// The prebuilt search bundle (documents and Fuse indexes), written once at build time.
import { entries } from '../../components/content-entries.ts';
import { buildSearchIndex, type MechanismInput, type SpeciesInput } from '../../site/index.ts';

/** The bundle as JSON, for the search page to fetch. */
export async function GET(): Promise<Response> {
  const byId = (a: { id: string }, b: { id: string }) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
  const mechanisms: MechanismInput[] = (await entries('mechanisms')).sort(byId).map((e) => e.data);
  const species: SpeciesInput[] = (await entries('species')).sort(byId).map((e) => e.data);
  return new Response(JSON.stringify(buildSearchIndex(mechanisms, species)), {
    headers: { 'Content-Type': 'application/json; charset=utf-8' },
  });
}
