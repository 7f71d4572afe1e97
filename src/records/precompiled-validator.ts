/**
 * The record validator as ajv standalone code, where the command was compiled with it: when
 * scripts/compile-cli.mjs bundles the command, it replaces this module with the generated code
 * (standalone-validator.ts), so the compiled command never compiles the schema. From source
 * (tests, the site build) there is none, and the schema is compiled at first use.
 */
import type { ErrorObject } from 'ajv';
import type { MechanismRecord } from '../model/index.ts';

/** Validates data against the record schema; `errors` lists every problem (ajv `allErrors`). */
export interface RecordValidator {
  (data: unknown): data is MechanismRecord;
  errors?: ErrorObject[] | null;
}

/** The precompiled validator, or undefined when running from source. */
export function precompiledValidator(): RecordValidator | undefined {
  return undefined;
}
