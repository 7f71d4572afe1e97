/**
 * The cache key of a record's derivation: a hash of everything the derivation of the record (and
 * what is built from it) depends on — the record's text, the bytes of every data file it names
 * (or that it cannot be read), the derivation options, the engine's version and the schema. The
 * file's name and place are not in it: two files with one text share an entry, and diagnostics
 * are placed afresh on every use.
 */
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import type { DeriveOptions } from '../engine/index.ts';
import { recordSchema, resolveDataPath, type LoadedRecord } from '../records/index.ts';

let schemaHash: string | undefined;

/** The key of a loaded, valid record's derivation under `engine`. */
export async function derivationKey(
  loaded: Pick<LoadedRecord, 'file' | 'source' | 'record'>,
  options: DeriveOptions,
  engine: string,
): Promise<string> {
  schemaHash ??= createHash('sha256').update(JSON.stringify(recordSchema)).digest('hex');
  const hash = createHash('sha256');
  const field = (text: string | Uint8Array) => hash.update(`${text.length}:`).update(text);
  field(engine);
  field(schemaHash);
  field(JSON.stringify([options.approximationThreshold ?? null, options.simulate ?? null]));
  field(loaded.source);
  for (const observation of loaded.record?.observations ?? []) {
    const reference = observation.data?.file;
    if (reference === undefined) continue;
    field(reference);
    const resolved = await resolveDataPath(loaded.file, reference);
    if ('problem' in resolved) {
      field('unusable');
      continue;
    }
    try {
      field(await readFile(resolved.path));
    } catch {
      field('unreadable');
    }
  }
  return hash.digest('hex');
}
