/**
 * An observation's data file must be named by a relative path that stays inside the content
 * folder (the folder above the one holding the records: `content/` for
 * `content/mechanisms/x.yaml`), so a catalogue never reads files from elsewhere on the machine, and
 * checking one record or its whole folder reads the same files.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const dataPath = {
  id: 'data/path',
  summary: "an observation's data file lies outside the content folder",
} as const satisfies RuleDefinition;
