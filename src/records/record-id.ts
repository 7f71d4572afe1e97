/**
 * A record's id is its file name, and it becomes part of page URLs, so it follows the same slug
 * rule as `system` in the schema (read from the schema, so the two cannot disagree).
 */
import { basename } from 'node:path';
import schema from '../../schemas/mechanism.schema.json' with { type: 'json' };

const SLUG = new RegExp(schema.$defs.Slug.pattern);

/** The id of a record file: its base name without .yaml or .yml. */
export function recordId(file: string): string {
  return basename(file).replace(/\.ya?ml$/i, '');
}

/** True when `id` is a valid record id (lower-case letters, digits, single hyphens). */
export function isRecordId(id: string): boolean {
  return SLUG.test(id);
}

/** A valid id close to `id`, for the "rename the file" hint: `Halide Route_2` → `halide-route-2`. */
export function suggestRecordId(id: string): string {
  const slug = id
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return slug === '' ? 'mechanism' : slug;
}
