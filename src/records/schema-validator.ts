/**
 * The record schema, compiled once per run. Compiling costs far more than validating, and a
 * catalogue check validates every record against the same schema.
 */
import { Ajv2020 } from 'ajv/dist/2020.js';
import type { ErrorObject, ValidateFunction } from 'ajv';
import addFormats from 'ajv-formats';
import schema from '../../schemas/mechanism.schema.json' with { type: 'json' };
import type { MechanismRecord } from '../model/index.ts';

/** The JSON Schema of a record (schemas/mechanism.schema.json). */
export const recordSchema: Readonly<Record<string, unknown>> = schema;

/** Validates data against the record schema; `errors` lists every problem (ajv `allErrors`). */
export interface RecordValidator {
  (data: unknown): data is MechanismRecord;
  errors?: ErrorObject[] | null;
}

/** Compiles the record schema; strict, so a mistake in the schema fails here, not in a record. */
export function createValidator(): RecordValidator {
  const ajv = new Ajv2020({
    allErrors: true,
    strict: true,
    // Quantities are `string | number` and formulas `string | null`: unions are deliberate.
    allowUnionTypes: true,
    // The message formatter reads parentSchema (titles, minimum, property names) and data.
    verbose: true,
  });
  // ajv-formats is CommonJS; its ESM default import is the module object, whose .default is the plugin.
  addFormats.default(ajv, ['date', 'uri']);
  const validate: ValidateFunction<MechanismRecord> = ajv.compile<MechanismRecord>(schema);
  return validate;
}

let shared: RecordValidator | undefined;

/** The validator shared by every load in this process, compiled on first use. */
export function recordValidator(): RecordValidator {
  shared ??= createValidator();
  return shared;
}
