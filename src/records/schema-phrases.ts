/**
 * The words schema messages are built from. ajv knows keywords and patterns; a chemist editing a
 * record knows "a list", "a whole number" and "lower-case letters, digits and hyphens".
 */

const TYPE_WORDS: Readonly<Record<string, string>> = {
  object: 'a mapping of fields',
  array: 'a list',
  string: 'text',
  number: 'a number',
  integer: 'a whole number',
  boolean: 'true or false',
  null: 'empty',
};

/** What a value of the given schema type(s) is called, e.g. "text or a number". */
export function typeWords(types: unknown, title?: unknown): string {
  if (title === 'QuantityText') return 'a quantity: a number, or text such as 56 kJ/mol';
  const list = Array.isArray(types) ? types : [types];
  return list.map((type) => TYPE_WORDS[String(type)] ?? String(type)).join(' or ');
}

/** How an actual value is named after "not": short text is quoted, the rest is named by kind. */
export function describeValue(value: unknown): string {
  if (value === null || value === undefined) return 'empty';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'a mapping';
  if (typeof value === 'string') return value.length <= 40 ? `'${value}'` : 'text';
  return String(value);
}

const PATTERNS_BY_TITLE: Readonly<Record<string, string>> = {
  Slug: 'must use only lower-case letters, digits and single hyphens',
  SpeciesSymbol: 'must not contain spaces',
  StepLabel: 'must use only letters, digits and underscores',
  Doi: 'must be a DOI such as 10.1000/xyz123 (without https://doi.org/)',
};

const PATTERNS: Readonly<Record<string, string>> = {
  '^InChI=': 'must start with InChI=',
};

/** The rule a `pattern` stands for, named by the schema definition's title or the pattern itself. */
export function patternWords(pattern: unknown, title: unknown): string {
  return PATTERNS_BY_TITLE[String(title)] ?? PATTERNS[String(pattern)] ?? `must match the pattern ${String(pattern)}`;
}

const FORMATS: Readonly<Record<string, string>> = {
  date: 'must be a date written YYYY-MM-DD',
  uri: 'must be a full web address such as https://example.org/paper',
};

/** The rule a `format` stands for. */
export function formatWords(format: unknown): string {
  return FORMATS[String(format)] ?? `must be a valid ${String(format)}`;
}

const FIELDS: Readonly<Record<string, string>> = {
  title: 'a title',
  system: 'a system',
  status: 'a status',
  steps: 'a list of steps',
  equation: 'an equation',
  id: 'an id',
};

/** A required field as the object of "must have …". */
export function fieldWords(name: string): string {
  return FIELDS[name] ?? `the field '${name}'`;
}

const COMPARISONS: Readonly<Record<string, string>> = { '>=': '≥', '>': '>', '<=': '≤', '<': '<' };

/** "≥ 0", "< 10" from ajv's comparison and limit. */
export function comparisonWords(comparison: unknown, limit: unknown): string {
  return `${COMPARISONS[String(comparison)] ?? String(comparison)} ${String(limit)}`;
}
