/**
 * A record's id is its file name, and it becomes part of page URLs and file names in the site, so
 * it follows the same slug rule as `system` in the schema, length included (read from the schema,
 * so the two cannot disagree): no empty id, no dots that would climb out of a folder, no name too
 * long for a file system once the site adds its suffixes.
 */
import { basename } from 'node:path';
import schema from '../../schemas/mechanism.schema.json' with { type: 'json' };

const SLUG = new RegExp(schema.$defs.Slug.pattern);

/** The longest record id: the schema's limit on a slug. */
export const MAX_ID_LENGTH: number = schema.$defs.Slug.maxLength;

/** The id of a record file: its base name without .yaml or .yml. */
export function recordId(file: string): string {
  return basename(file).replace(/\.ya?ml$/i, '');
}

/** True when `id` is a valid record id (lower-case letters, digits, single hyphens; not too long). */
export function isRecordId(id: string): boolean {
  return SLUG.test(id) && id.length <= MAX_ID_LENGTH;
}

/** Why `id` cannot be a record id, in words, or undefined when it can. */
export function recordIdProblem(id: string): string | undefined {
  if (isRecordId(id)) return undefined;
  if (id === '') return 'the file name gives an empty record id';
  if (id.length > MAX_ID_LENGTH)
    return `the file name gives a record id of ${id.length} characters; at most ${MAX_ID_LENGTH} fit in the site's file names`;
  return `the file name '${id}' cannot be a record id: use lower-case letters, digits and single hyphens`;
}

/** A valid id close to `id`, for the "rename the file" hint: `Halide Route_2` → `halide-route-2`. */
export function suggestRecordId(id: string): string {
  const slug = id
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, MAX_ID_LENGTH)
    .replace(/-+$/, '');
  return slug === '' ? 'mechanism' : slug;
}
