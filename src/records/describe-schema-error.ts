/**
 * One ajv error as one sentence a chemist can act on, written from the keyword and its params
 * (never ajv's own wording), pointing at the value or at the key that is wrong.
 */
import type { ErrorObject } from 'ajv';
import type { RecordPath } from '../model/index.ts';
import { closestName } from './closest-name.ts';
import { comparisonWords, describeValue, fieldWords, formatWords, patternWords, typeWords } from './schema-phrases.ts';

/** One schema problem, located by a path into the record; `at: 'key'` points at a field name. */
export interface SchemaProblem {
  path: RecordPath;
  at: 'value' | 'key';
  message: string;
  actual?: unknown;
  expected?: unknown;
}

/** A described error; `path` is set only where it differs from the error's own (a key, an item). */
export type DescribedError = Omit<SchemaProblem, 'path'> & { path?: RecordPath };

function isRequiredOnly(branch: unknown): branch is { required: string[] } {
  if (typeof branch !== 'object' || branch === null || !('required' in branch)) return false;
  return Object.keys(branch).every((key) => key === 'required' || key === 'properties');
}

function alternatives(error: ErrorObject): string {
  const branches: unknown[] = Array.isArray(error.schema) ? error.schema : [];
  if (branches.length > 0 && branches.every(isRequiredOnly)) {
    const names = branches.flatMap((branch) => (branch as { required: string[] }).required);
    return `must have at least one of ${names.join(', ')}`;
  }
  return error.keyword === 'oneOf' && error.params.passingSchemas
    ? 'must match only one of the allowed forms'
    : 'does not match any of the allowed forms';
}

/**
 * Describes one error at `path`, which `where` names at the start of the sentence; undefined for
 * summary errors (propertyNames, if) whose nested errors say what is wrong.
 */
export function describeSchemaError(error: ErrorObject, path: RecordPath, where: string): DescribedError | undefined {
  const { keyword, params, parentSchema: parent = {}, data } = error;
  const wholeNumber = parent.type === 'integer' && typeof parent.minimum === 'number';
  const suggest = (name: string | undefined): string => (name ? ` (did you mean '${name}'?)` : '');
  switch (keyword) {
    case 'additionalProperties': {
      const name = String(params.additionalProperty);
      const known = Object.keys(parent.properties ?? {});
      const guess = closestName(name, known);
      const message = `${where} has an unknown field '${name}'${suggest(guess)}`;
      return { path: [...path, name], at: 'key', message, actual: name, expected: guess ?? known };
    }
    case 'required': {
      const name = String(params.missingProperty);
      return { at: 'value', message: `${where} must have ${fieldWords(name)}`, expected: name };
    }
    case 'enum': {
      const allowed = (params.allowedValues as unknown[]).map(String);
      const guess = typeof data === 'string' ? closestName(data, allowed) : undefined;
      const message = `${where} must be one of ${allowed.join(', ')}${suggest(guess)}`;
      return { at: 'value', message, actual: data, expected: allowed };
    }
    case 'type': {
      if (wholeNumber) {
        const message = `${where} must be a whole number ${comparisonWords('>=', parent.minimum)}`;
        return { at: 'value', message, actual: data, expected: params.type };
      }
      const message = `${where} must be ${typeWords(params.type, parent.title)}, not ${describeValue(data)}`;
      return { at: 'value', message, actual: data, expected: params.type };
    }
    case 'minimum':
    case 'exclusiveMinimum':
    case 'maximum':
    case 'exclusiveMaximum': {
      const bound = comparisonWords(params.comparison, params.limit);
      const kind = wholeNumber && keyword === 'minimum' ? 'a whole number ' : '';
      return {
        at: 'value',
        message: `${where} must be ${kind}${bound}`,
        actual: data,
        expected: bound,
      };
    }
    case 'minLength':
    case 'minItems': {
      const unit = keyword === 'minLength' ? 'characters' : 'items';
      const rule = params.limit === 1 ? 'must not be empty' : `must have at least ${String(params.limit)} ${unit}`;
      return { at: 'value', message: `${where} ${rule}`, actual: data };
    }
    case 'uniqueItems': {
      const [first, second] = [Number(params.j), Number(params.i)].sort((a, b) => a - b);
      const message = `${where} lists the same item twice (${first} and ${second})`;
      return { path: [...path, second ?? 0], at: 'value', message, actual: data };
    }
    case 'pattern': {
      const rule = patternWords(params.pattern, parent.title);
      return { at: 'value', message: `${where} ${rule}`, actual: data };
    }
    case 'format':
      return { at: 'value', message: `${where} ${formatWords(params.format)}`, actual: data };
    case 'maxLength': {
      const length = typeof data === 'string' ? data.length : undefined;
      const message = `${where} is ${length ?? 'too many'} characters long; at most ${String(params.limit)} are allowed`;
      return { at: 'value', message, actual: length, expected: params.limit };
    }
    case 'anyOf':
    case 'oneOf':
      return { at: 'value', message: `${where} ${alternatives(error)}`, actual: data };
    case 'propertyNames':
    case 'if':
      // The errors nested under these say what is wrong; the summary adds only noise.
      return undefined;
    default:
      return { at: 'value', message: `${where} ${error.message ?? 'is not valid'}`, actual: data };
  }
}
