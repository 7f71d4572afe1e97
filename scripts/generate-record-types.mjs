#!/usr/bin/env node
/**
 * Writes src/model/mechanism-record.ts from schemas/mechanism.schema.json, so the record types
 * cannot drift from the schema. `--stdout` prints the result instead (the freshness test uses it).
 */
import { readFile, writeFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { compile } from 'json-schema-to-typescript';

const schemaPath = fileURLToPath(new URL('../schemas/mechanism.schema.json', import.meta.url));
const outputPath = fileURLToPath(new URL('../src/model/mechanism-record.ts', import.meta.url));

const BANNER = `/**
 * GENERATED from schemas/mechanism.schema.json by scripts/generate-record-types.mjs.
 * Do not edit by hand: change the schema, then run \`npm run types\`.
 */`;

/** Rewrites the schema into the shape that gives the clearest TypeScript (validation is unaffected). */
function prepareForTypes(schema) {
  const titles = new Map(Object.entries(schema.$defs ?? {}).map(([name, def]) => [`#/$defs/${name}`, def.title]));
  return transform(schema, titles);
}

function transform(node, titles) {
  if (Array.isArray(node)) return node.map((item) => transform(item, titles));
  if (node === null || typeof node !== 'object') return node;
  const out = {};
  for (const [key, value] of Object.entries(node)) out[key] = transform(value, titles);
  // A $ref beside a description would become a numbered copy (QuantityText1, QuantityText2…);
  // naming the type directly keeps one QuantityText and still carries the description.
  const title = typeof out.$ref === 'string' ? titles.get(out.$ref) : undefined;
  if (title !== undefined && Object.keys(out).length > 1) {
    delete out.$ref;
    out.tsType = title;
  }
  // "At least one of these fields" cannot be said usefully in a type; ajv still enforces it.
  if (Array.isArray(out.anyOf) && out.anyOf.every(isRequiredOnly)) delete out.anyOf;
  return out;
}

function isRequiredOnly(branch) {
  return Object.keys(branch).every((key) => key === 'required' || key === 'properties');
}

/** Returns the TypeScript source for the record types. */
export async function generateRecordTypes() {
  const schema = JSON.parse(await readFile(schemaPath, 'utf8'));
  const code = await compile(prepareForTypes(schema), 'MechanismRecord', {
    bannerComment: BANNER,
    // tsType names a $defs type, so every definition must be declared even when only named.
    unreachableDefinitions: true,
    // steps stays StepEntry[] (not a non-empty tuple): code that builds records keeps working.
    ignoreMinAndMaxItems: true,
    style: { singleQuote: true, printWidth: 100, trailingComma: 'all' },
  });
  return code;
}

const invokedDirectly = process.argv[1] === fileURLToPath(import.meta.url);
if (invokedDirectly) {
  const code = await generateRecordTypes();
  if (process.argv.includes('--stdout')) process.stdout.write(code);
  else await writeFile(outputPath, code);
}
