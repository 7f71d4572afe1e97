// /api/species.json: every species across the catalogue, its identity and its role in each mechanism.
import { atlasSpecies } from '../../components/content-entries.ts';
import { jsonResponse, toolVersion } from '../../site/index.ts';

/** The species collection. */
export async function GET(): Promise<Response> {
  const species = await atlasSpecies();
  return jsonResponse({ tool: { name: 'mechatlas', version: toolVersion() }, species });
}
