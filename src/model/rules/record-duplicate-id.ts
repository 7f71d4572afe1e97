/**
 * Two files in one folder give the same record id (`x.yaml` beside `x.yml`, or `x.YAML`): their
 * pages and API entries would overwrite each other, so one proposal would silently vanish from
 * the site. Both files get this error, naming the other, and neither is published until one is
 * renamed.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const recordDuplicateId = {
  id: 'record/duplicate-id',
  summary: 'two record files give the same id',
} as const satisfies RuleDefinition;
