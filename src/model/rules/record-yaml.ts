/**
 * The record file could not be read as one YAML mapping: a syntax error, a duplicate key, a list
 * or several documents where one mapping is expected, or an alias expansion beyond the safe bound.
 * Nothing else is checked until the file reads; the position points at the offending character.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const recordYaml = {
  id: 'record/yaml',
  summary: 'the file is not well-formed YAML',
} as const satisfies RuleDefinition;
