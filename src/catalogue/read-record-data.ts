/**
 * The data sets of one record: its observations' tables read by src/records (inline or from CSV
 * files inside the content folder), then converted and checked by the engine against the
 * mechanism's species. Kept apart from checkRecordFile so the derivation cache (and the later
 * fitting stage) can take the data sets as one value; a cache must key on the CSV files too.
 */
import { readKineticData, type KineticData } from '../engine/index.ts';
import type { Diagnostic } from '../model/index.ts';
import { readObservationData, type LoadedRecord } from '../records/index.ts';

/** Reads and checks every observation's data; `species` are the mechanism's symbols, when it could be built. */
export async function readRecordData(
  loaded: Pick<LoadedRecord, 'file' | 'record' | 'locate'>,
  species: readonly string[] | undefined,
): Promise<{ data: KineticData[]; diagnostics: Diagnostic[] }> {
  const read = await readObservationData(loaded);
  const diagnostics = [...read.diagnostics];
  const data: KineticData[] = [];
  for (const table of read.tables) {
    // Without a mechanism (an equation that does not parse) the species cannot be checked; the
    // table's own symbols stand in, so units and points are still checked.
    const known = species ?? table.columns.map((c) => c.name);
    const result = readKineticData(table, known);
    diagnostics.push(...result.diagnostics);
    if (result.data) data.push(result.data);
  }
  return { data, diagnostics };
}
