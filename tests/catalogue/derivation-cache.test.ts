/**
 * The derivation cache: reports, derivations written out and the site's page models are the
 * same to the byte with and without it (cold and warm); a damaged entry is ignored and derived
 * again; a changed CSV data file makes a new key; the codec keeps every exact value's class.
 */
import { cpSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import {
  checkRecordFiles,
  decodeDerivationValue,
  derivationKey,
  encodeDerivationValue,
  engineVersion,
  loadCatalogue,
  openDerivationCache,
  type CheckedRecord,
  type DerivationCache,
} from '../../src/catalogue/index.ts';
import { catalogueReport, derivationText, textReport } from '../../src/render/index.ts';
import { loadRecordSource } from '../../src/records/index.ts';
import { siteCatalogue } from '../../src/site/index.ts';
import { ETHANE, HYDROGEN_BROMINE } from '../helpers/chain-records.ts';

const work = mkdtempSync(join(tmpdir(), 'mechatlas-cache-test-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

const folders = ['content/mechanisms', 'tests/fixtures/ok'];
const files = folders.flatMap((f) =>
  readdirSync(f)
    .filter((n) => n.endsWith('.yaml'))
    .map((n) => `${f}/${n}`),
);

/** Everything a person or a tool reads of a set of checked records. */
function written(checked: CheckedRecord[]): string {
  const report = catalogueReport(checked, 'test');
  return [JSON.stringify(report), textReport(report), ...checked.map((c) => derivationText(c))].join('\n\f\n');
}

/** Writes a record file into the scratch folder; its path. */
function write(name: string, text: string): string {
  const file = join(work, 'records', 'mechanisms', name);
  mkdirSync(dirname(file), { recursive: true });
  writeFileSync(file, text);
  return file;
}

function freshCache(name: string): DerivationCache {
  return openDerivationCache(join(work, name), engineVersion()!);
}

describe('the derivation cache', () => {
  it('knows the engine version from the sources', () => {
    expect(engineVersion()).toMatch(/^[0-9a-f]{64}$/);
  });

  it('changes no byte of the reports or the derivations written out, cold or warm', async () => {
    const cache = freshCache('reports');
    const without = written(await checkRecordFiles(files));
    const cold = await checkRecordFiles(files, {}, { cache });
    expect(cold.filter((c) => c.cacheKey !== undefined).length).toBe(files.length);
    const warm = await checkRecordFiles(files, {}, { cache });
    // Every record came from the cache the second time (its derivation decoded, not the one just made).
    for (const [i, c] of warm.entries()) expect(c.derivation).not.toBe(cold[i]!.derivation);
    expect(written(cold)).toBe(without);
    expect(written(warm)).toBe(without);
  }, 120_000);

  it('changes no byte of the site page models (judged rivals and plotted series included)', async () => {
    const cache = freshCache('site');
    const plain = JSON.stringify(siteCatalogue(await loadCatalogue('content/mechanisms')));
    const cold = JSON.stringify(siteCatalogue(await loadCatalogue('content/mechanisms', { cache })));
    const warm = JSON.stringify(siteCatalogue(await loadCatalogue('content/mechanisms', { cache })));
    expect(cold).toBe(plain);
    expect(warm).toBe(plain);
  }, 120_000);

  it('ignores a damaged entry, derives the record again and writes a sound entry', async () => {
    const cache = freshCache('damaged');
    const file = 'content/mechanisms/kx7-hydroarylation-alkene-first.yaml';
    const [first] = await checkRecordFiles([file], {}, { cache });
    const key = first!.cacheKey!;
    const entry = join(work, 'damaged', key.slice(0, 2), `${key}.derivation`);
    const sound = readFileSync(entry);
    // One flipped byte in the payload: the checksum no longer matches.
    const flipped = Buffer.from(sound);
    flipped[flipped.length - 10]! ^= 0xff;
    writeFileSync(entry, flipped);
    expect(cache.read(key, 'derivation')).toBeUndefined();
    const [again] = await checkRecordFiles([file], {}, { cache });
    expect(written([again!])).toBe(written([first!]));
    // A sound entry again (its bytes may differ from the first: a simulation run remembered within the
    // process is shared by reference, and the serialiser writes shared objects once).
    expect(cache.read(key, 'derivation')).toBeDefined();
    // An entry written for another key (a file copied by hand) is not used either.
    writeFileSync(entry, sound.toString('latin1').replace(key, 'f'.repeat(64)), 'latin1');
    expect(cache.read(key, 'derivation')).toBeUndefined();
    // Nor is a truncated file, nor an empty one.
    writeFileSync(entry, sound.subarray(0, 100));
    expect(cache.read(key, 'derivation')).toBeUndefined();
    writeFileSync(entry, '');
    expect(cache.read(key, 'derivation')).toBeUndefined();
  }, 60_000);

  it('makes a new key when a CSV data file the record names changes', async () => {
    const content = join(work, 'csv-content');
    cpSync('tests/fixtures/ok/data-csv.yaml', join(content, 'mechanisms', 'data-csv.yaml'));
    cpSync('tests/fixtures/data', join(content, 'data'), { recursive: true });
    const file = join(content, 'mechanisms', 'data-csv.yaml');
    const cache = freshCache('csv');
    const [before] = await checkRecordFiles([file], {}, { cache });
    const csv = join(content, 'data', 'ok-temperatures.csv');
    writeFileSync(csv, readFileSync(csv, 'utf8') + '\n');
    const [after] = await checkRecordFiles([file], {}, { cache });
    expect(after!.cacheKey).not.toBe(before!.cacheKey);
    expect(cache.read(after!.cacheKey!, 'derivation')).toBeDefined();
    // The record's own text unchanged, only the data: the key still follows the data.
    const loaded = { file, source: readFileSync(file, 'utf8'), record: after!.record! };
    expect(await derivationKey(loaded, {}, cache.engine)).toBe(after!.cacheKey);
    rmSync(csv);
    expect(await derivationKey(loaded, {}, cache.engine)).not.toBe(after!.cacheKey);
  }, 60_000);

  it('keeps the classes of exact values, laws with radicals included, and refuses what it cannot keep', async () => {
    const [chain] = await checkRecordFiles(['tests/fixtures/ok/long-chain.yaml']);
    const decoded = decodeDerivationValue(encodeDerivationValue(chain!.derivation));
    expect(derivationText({ ...chain!, derivation: decoded as never })).toBe(derivationText(chain!));
    // Closed forms with radicals (AlgebraicFunction, PositiveRoot): the ethane chain's quadratic, H2 + Br2.
    for (const [id, body] of [
      ['ethane', ETHANE],
      ['hydrogen-bromine', HYDROGEN_BROMINE],
    ]) {
      const yaml = `title: ${id}\nsystem: test\nstatus: proposed\n${body}`;
      const [checked] = await checkRecordFiles([write(`${id}.yaml`, yaml)]);
      const bytes = encodeDerivationValue(checked!.derivation);
      if (id === 'ethane') expect(bytes.includes('AlgebraicFunction')).toBe(true);
      const again = decodeDerivationValue(bytes);
      expect(derivationText({ ...checked!, derivation: again as never })).toBe(derivationText(checked!));
      expect(loadRecordSource(`${id}.yaml`, yaml).record).toBeDefined();
    }
    expect(() => encodeDerivationValue({ f: () => 1 })).toThrow();
    expect(() => encodeDerivationValue({ d: new (class Strange {})() })).toThrow();
  }, 60_000);
});
