/**
 * The YAML reads, but a field is missing, misspelt, of the wrong type or outside its allowed
 * values according to schemas/mechanism.schema.json. The message names the field by its path in
 * the record and, for a misspelling, the closest allowed name.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const recordSchema = {
  id: 'record/schema',
  summary: 'the record does not match the record format',
} as const satisfies RuleDefinition;
