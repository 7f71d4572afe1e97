/**
 * An observation's data file must exist, be readable and be CSV that parses: a header line, then
 * one line per measurement, quotes closed. The file is parsed with csv-parse; its errors are given
 * at their line.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const dataFile = {
  id: 'data/file',
  summary: "an observation's data file cannot be read as CSV",
} as const satisfies RuleDefinition;
