/**
 * Turns the list ajv reports into the list a reader needs: one problem per mistake, with list
 * indices as numbers, the noise of anyOf/oneOf branches folded away and repeats dropped.
 */
import type { ErrorObject } from 'ajv';
import { pathWords as wordsForPath, type RecordPath } from '../model/index.ts';
import { describeSchemaError } from './describe-schema-error.ts';
import type { SchemaProblem } from './describe-schema-error.ts';

/** Decodes a JSON Pointer, turning segments that index a list into numbers (as the engine does). */
export function recordPath(pointer: string, data: unknown): RecordPath {
  const path: (string | number)[] = [];
  let current = data;
  for (const raw of pointer.split('/').slice(1)) {
    const segment = raw.replace(/~1/g, '/').replace(/~0/g, '~');
    if (Array.isArray(current)) {
      path.push(Number(segment));
      current = current[Number(segment)];
    } else {
      path.push(segment);
      const isObject = typeof current === 'object' && current !== null;
      current = isObject ? (current as Record<string, unknown>)[segment] : undefined;
    }
  }
  return path;
}

/** How a path reads at the start of a message: "step 3, k" (counted from 1), or "the record" for the whole file. */
export function pathWords(path: RecordPath): string {
  return wordsForPath(path);
}

function isAlternativeNoise(error: ErrorObject, all: readonly ErrorObject[]): boolean {
  return all.some(
    (group) =>
      group !== error &&
      (group.keyword === 'anyOf' || group.keyword === 'oneOf') &&
      (error.instancePath === group.instancePath || error.instancePath.startsWith(`${group.instancePath}/`)) &&
      error.schemaPath.startsWith(`${group.schemaPath}/`),
  );
}

/**
 * Describes ajv's errors once each: the failed branches of an anyOf/oneOf fold into one sentence,
 * and a value that breaks two keywords with the same meaning (type integer, minimum 0) gets one.
 */
export function describeSchemaErrors(errors: readonly ErrorObject[], data: unknown): SchemaProblem[] {
  const problems: SchemaProblem[] = [];
  const seen = new Set<string>();
  for (const error of errors) {
    if (isAlternativeNoise(error, errors)) continue;
    const path = recordPath(error.instancePath, data);
    const name = error.propertyName;
    // Errors under propertyNames are about a key of the mapping, not the mapping's value.
    const described =
      name === undefined
        ? describeSchemaError(error, path, pathWords(path))
        : describeSchemaError(error, path, `${pathWords(path)} key '${name}'`);
    if (described === undefined) continue;
    const problem: SchemaProblem =
      name === undefined
        ? { ...described, path: described.path ?? path }
        : { ...described, path: [...path, name], at: 'key' };
    const identity = `${problem.at} ${JSON.stringify(problem.path)} ${problem.message}`;
    if (seen.has(identity)) continue;
    seen.add(identity);
    problems.push(problem);
  }
  return problems;
}
