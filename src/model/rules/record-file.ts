/**
 * The file cannot be a record: it is not a regular file (a folder, a named pipe or a device, which
 * would block or never end), it is larger than a record ever needs to be (a mistake, or an attempt
 * to make the check run for minutes), or it is not UTF-8 text (bytes that would otherwise be read
 * as replacement characters, silently changing what the record says).
 */
import type { RuleDefinition } from './rule-definition.ts';

export const recordFile = {
  id: 'record/file',
  summary: 'the file is not a regular UTF-8 text file of a sane size',
} as const satisfies RuleDefinition;
