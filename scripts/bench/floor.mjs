#!/usr/bin/env node
/**
 * The floor of a catalogue check: read every record file of a folder, parse its YAML (with line
 * counting, as the records layer does) and validate it against the record schema with ajv. No
 * derivation. `node scripts/bench/floor.mjs FOLDER` prints how many records were valid.
 */
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import addFormats from 'ajv-formats';
import { LineCounter, parseDocument } from 'yaml';

const folder = process.argv[2];
const schema = JSON.parse(await readFile(new URL('../../schemas/mechanism.schema.json', import.meta.url), 'utf8'));
const ajv = new Ajv2020({ allErrors: true, strict: true, allowUnionTypes: true, verbose: true });
addFormats.default(ajv, ['date', 'uri']);
const validate = ajv.compile(schema);
let valid = 0;
const files = (await readdir(folder)).filter((f) => f.endsWith('.yaml') || f.endsWith('.yml')).sort();
for (const f of files) {
  const text = await readFile(join(folder, f), 'utf8');
  const doc = parseDocument(text, { lineCounter: new LineCounter(), uniqueKeys: true });
  if (doc.errors.length === 0 && validate(doc.toJS({ maxAliasCount: 100 }))) valid++;
}
console.log(`${valid} of ${files.length} records valid`);
