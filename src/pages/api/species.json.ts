// /api/species.json: every species across the catalogue, its identity and its role in each mechanism.
import { getCollection } from 'astro:content';
import { toolVersion } from '../../catalogue/tool-version.ts';
import { jsonResponse } from '../../site/api-report.ts';
import type { SpeciesPage } from '../../catalogue/catalogue.ts';

/** The species collection. */
export async function GET(): Promise<Response> {
  const entries = await getCollection('species');
  const species = entries.map((e) => e.data as unknown as SpeciesPage).sort((a, b) => a.symbol.localeCompare(b.symbol));
  return jsonResponse({ tool: { name: 'mechatlas', version: toolVersion() }, species });
}
