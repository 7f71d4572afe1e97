/**
 * The compiled command validates records with ajv's standalone code (generated when it is
 * compiled); from source the schema is compiled at first use. Both must give the same errors,
 * to the last field (the message formatter reads `parentSchema` and `data`), on every record of
 * the fixtures, the bad-input corpus and the demo.
 */
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import {
  createValidator,
  describeSchemaErrors,
  parseRecordYaml,
  type RecordValidator,
} from '../../src/records/index.ts';
import { standaloneValidatorSource } from '../../src/records/standalone-validator.ts';

const root = resolve(import.meta.dirname, '..', '..');
// Inside the package, so the generated code's require() finds ajv's runtime and the formats.
const scratch = join(root, 'node_modules', '.cache', `mechatlas-standalone-${process.pid}`);
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

function recordsOf(folder: string): { name: string; data: unknown }[] {
  return readdirSync(folder)
    .filter((f) => /\.ya?ml$/.test(f))
    .map((f) => ({ name: `${folder}/${f}`, parsed: parseRecordYaml(readFileSync(join(root, folder, f), 'utf8')) }))
    .filter((r) => 'data' in r.parsed)
    .map((r) => ({ name: r.name, data: r.parsed.data }));
}

describe('the standalone record validator', () => {
  it('gives the same errors as the schema compiled at run time', async () => {
    mkdirSync(scratch, { recursive: true });
    const file = join(scratch, 'validator.mjs');
    writeFileSync(file, standaloneValidatorSource());
    const module = (await import(pathToFileURL(file).href)) as { precompiledValidator(): RecordValidator };
    const standalone = module.precompiledValidator();
    const compiled = createValidator();
    const records = ['tests/fixtures/ok', 'tests/fixtures/not-ok', 'content/mechanisms'].flatMap(recordsOf);
    expect(records.length).toBeGreaterThan(100);
    let invalid = 0;
    for (const { name, data } of records) {
      const a = compiled(data);
      const b = standalone(data);
      expect(b, name).toBe(a);
      if (!a) invalid++;
      expect(standalone.errors ?? null, name).toEqual(compiled.errors ?? null);
      if (!a)
        expect(describeSchemaErrors(standalone.errors!, data)).toEqual(describeSchemaErrors(compiled.errors!, data));
    }
    // The corpus holds schema errors of many kinds; the comparison must have seen some.
    expect(invalid).toBeGreaterThan(10);
  });
});
