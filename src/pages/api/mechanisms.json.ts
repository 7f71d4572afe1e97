// /api/mechanisms.json: every record's derivation and checks, as `mechatlas check --format json` prints them.
import { atlasRecords } from '../../components/content-entries.ts';
import { catalogueJson, jsonResponse } from '../../site/index.ts';

/** The catalogue report. */
export async function GET(): Promise<Response> {
  return jsonResponse(catalogueJson(await atlasRecords()));
}
