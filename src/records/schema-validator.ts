/**
 * The record schema, compiled once per run. Compiling costs far more than validating, and a
 * catalogue check validates every record against the same schema. The compiled command carries
 * the validator as ajv's standalone code, generated when it is compiled (precompiled-validator.ts,
 * scripts/compile-cli.mjs), so it compiles nothing at start; run from source, it compiles here.
 */
import { createRequire } from 'node:module';
import type { Ajv2020, Options } from 'ajv/dist/2020.js';
import type { ValidateFunction } from 'ajv';
import schema from '../../schemas/mechanism.schema.json' with { type: 'json' };
import type { MechanismRecord } from '../model/index.ts';
import { precompiledValidator, type RecordValidator } from './precompiled-validator.ts';

export type { RecordValidator } from './precompiled-validator.ts';

/** The JSON Schema of a record (schemas/mechanism.schema.json). */
export const recordSchema: Readonly<Record<string, unknown>> = schema;

/**
 * ajv and its formats, loaded on first use: loading them costs a large part of a short run's start,
 * and the compiled command, which validates with standalone code, never needs them.
 */
function loadAjv(): { Ajv: typeof Ajv2020; addFormats: typeof import('ajv-formats').default } {
  const require = createRequire(import.meta.url);
  const ajv = require('ajv/dist/2020.js') as typeof import('ajv/dist/2020.js');
  const formats = require('ajv-formats') as { default: typeof import('ajv-formats').default };
  return { Ajv: ajv.Ajv2020, addFormats: formats.default };
}

/** The one set of ajv options, for the validator compiled here and the standalone code alike. */
export function recordAjv(extra: Options = {}): Ajv2020 {
  const { Ajv, addFormats } = loadAjv();
  const ajv = new Ajv({
    allErrors: true,
    strict: true,
    // Quantities are `string | number` and formulas `string | null`: unions are deliberate.
    allowUnionTypes: true,
    // The message formatter reads parentSchema (titles, minimum, property names) and data.
    verbose: true,
    ...extra,
  });
  // ajv-formats is CommonJS: its module object's .default is the plugin.
  addFormats(ajv, ['date', 'uri']);
  return ajv;
}

/** Compiles the record schema; strict, so a mistake in the schema fails here, not in a record. */
export function createValidator(): RecordValidator {
  const validate: ValidateFunction<MechanismRecord> = recordAjv().compile<MechanismRecord>(schema);
  return validate;
}

let shared: RecordValidator | undefined;

/** The validator shared by every load in this process: the precompiled one, else compiled on first use. */
export function recordValidator(): RecordValidator {
  shared ??= precompiledValidator() ?? createValidator();
  return shared;
}
