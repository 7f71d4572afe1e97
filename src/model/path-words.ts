/**
 * A place in the record as a chemist reads it: list items counted from 1 as people count them
 * (`['steps', 0, 'k']` → "step 1, k"), never a JSON Pointer with indices from 0.
 */
import type { RecordPath } from './diagnostic.ts';

/** "step 1, k"; "step 2, energy barrier"; "species H+, role"; "the record" for the whole file. */
export function pathWords(path: RecordPath): string {
  if (path.length === 0) return 'the record';
  const parts: string[] = [];
  for (let i = 0; i < path.length; i++) {
    const segment = path[i]!;
    const next = path[i + 1];
    if (typeof next === 'number') {
      parts.push(`${String(segment).replace(/s$/, '')} ${next + 1}`);
      i++;
    } else if (segment === 'species' && i === 0 && next !== undefined) {
      parts.push(`species ${next}`);
      i++;
    } else parts.push(typeof segment === 'number' ? `item ${segment + 1}` : segment);
  }
  const [head, ...rest] = parts;
  return rest.length > 0 ? `${head}, ${rest.join(' ')}` : head!;
}
