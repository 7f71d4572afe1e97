/**
 * mechatlas itself failed while checking this record (an exception where every problem should be
 * a diagnostic). The record gets this error and the rest of the catalogue is still checked; the
 * command exits 3, so CI can tell a fault in the tool from findings in the records. It is a bug
 * to report to mechatlas's maintainers, with the record, not something the record's author fixes.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const internalFailure = {
  id: 'internal/failure',
  summary: 'mechatlas failed on this record (a fault in the tool, to report)',
} as const satisfies RuleDefinition;
