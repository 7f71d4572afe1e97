/**
 * Reads a record's YAML text into plain data, keeping the document (with ranges) for positions.
 * Nothing here throws: YAML problems become `record/yaml` diagnostics with line and column.
 */
import { LineCounter, Scalar, isAlias, isNode, parseDocument, visit } from 'yaml';
import type { Document, YAMLError } from 'yaml';
import { findAliasProblems } from './alias-problems.ts';
import { diagnostic } from '../model/index.ts';
import type { Diagnostic } from '../model/index.ts';
import { createLocator, keyText } from './source-positions.ts';
import type { RecordLocator } from './source-positions.ts';

/** The limit on alias expansion: records never need many, and a "billion laughs" file needs more. */
export const MAX_ALIAS_COUNT = 100;

/** A parsed record source: the document, a locator over it and, when it parsed, the data. */
export interface ParsedYaml {
  doc: Document.Parsed;
  locator: RecordLocator;
  /** Present only when the YAML had no errors. */
  data?: unknown;
  diagnostics: Diagnostic[];
}

const FRIENDLY: Partial<Record<YAMLError['code'], (text: string) => string>> = {
  DUPLICATE_KEY: (key) => `the field '${key}' appears twice in the same mapping`,
  TAB_AS_INDENT: () => 'tabs cannot indent YAML; indent with spaces',
  MULTIPLE_DOCS: () => 'the file holds more than one YAML document (a --- line); a record is one document',
  BAD_INDENT: () => 'the indentation is inconsistent here (or a bracket or quote is not closed)',
  BLOCK_AS_IMPLICIT_KEY: () =>
    'a value here contains ": " (colon and space), which YAML reads as a new field; put the value in quotes, or fix the indentation',
  MULTILINE_IMPLICIT_KEY: () => 'a field name must fit on one line (is a colon or indentation missing?)',
  TAG_RESOLVE_FAILED: (tag) => `the YAML tag ${tag} is not understood; the value is read as plain text`,
  RESOURCE_EXHAUSTION: () => 'the YAML nests too deeply to read; a record never needs more than a few levels',
};

function lowerFirst(text: string): string {
  return text.charAt(0).toLowerCase() + text.slice(1);
}

interface Pointed {
  text: string;
  start: number;
  end: number;
  /** a message that says more than yaml's for what is pointed at */
  message?: string;
}

/** What yaml's error points at; for a duplicate key, the whole key (yaml marks one character). */
function pointedAt(doc: Document.Parsed, problem: YAMLError, source: string): Pointed {
  const [start, end] = problem.pos;
  let pointed: Pointed = { text: source.slice(start, end).trim(), start, end };
  if (problem.code === 'MISSING_CHAR' && /quote/i.test(problem.message)) return openingQuote(doc, start) ?? pointed;
  if (problem.code !== 'DUPLICATE_KEY') return pointed;
  visit(doc, {
    Pair(_key, pair) {
      if (!isNode(pair.key) || pair.key.range?.[0] !== start) return undefined;
      pointed = { text: keyText(pair.key), start, end: pair.key.range[1] };
      return visit.BREAK;
    },
  });
  return pointed;
}

// The tags whose values read as the plain JSON data a record is: anything else (!!omap, !!set,
// !!binary, !!timestamp, !!pairs) becomes a Map, Set, byte array or Date, whose contents the
// schema check cannot see, so what is declared under it would be dropped without a word.
const PLAIN_TAGS = new Set(['str', 'int', 'float', 'bool', 'null', 'map', 'seq'].map((t) => `tag:yaml.org,2002:${t}`));

/** A `record/yaml` error for each node under a tag that does not read as plain data. */
function unusualTags(doc: Document.Parsed, locator: RecordLocator): Diagnostic[] {
  const diagnostics: Diagnostic[] = [];
  visit(doc, {
    Node(_key, node) {
      if (isAlias(node) || node.tag === undefined || PLAIN_TAGS.has(node.tag)) return;
      // A tag yaml does not know is already a warning, and its value is read as plain data.
      if (!doc.schema.tags.some((t) => t.tag === node.tag)) return;
      const range = node.range ?? [0, 0];
      const short = node.tag.replace('tag:yaml.org,2002:', '!!');
      const message = `the YAML tag ${short} makes a value a record cannot hold; remove the tag and write plain YAML`;
      diagnostics.push(
        diagnostic('record/yaml', 'error', message, { ...locator.span(range[0], range[1]), actual: short }),
      );
    },
  });
  return diagnostics;
}

const scalarText = (node: Scalar): string => String(node.source ?? node.value);

/** The opening quote of the quoted scalar that runs to `end` unclosed (yaml notices only where the text ends). */
function openingQuote(doc: Document.Parsed, end: number): Pointed | undefined {
  let found: Pointed | undefined;
  visit(doc, {
    Scalar(_key, node) {
      const quoted = node.type === Scalar.QUOTE_DOUBLE || node.type === Scalar.QUOTE_SINGLE;
      const [from, to] = node.range ?? [0, 0];
      if (quoted && from < end && to >= end)
        found = { text: scalarText(node), start: from, end: from + 1, message: 'this quote is never closed' };
    },
  });
  return found;
}

function yamlDiagnostics(doc: Document.Parsed, source: string, locator: RecordLocator): Diagnostic[] {
  const diagnostics: Diagnostic[] = [];
  const linesWithErrors = new Set<number>();
  for (const problem of [...doc.errors, ...doc.warnings]) {
    const friendly = FRIENDLY[problem.code];
    const { text, start, end, message: better } = pointedAt(doc, problem, source);
    const message = better ?? (friendly === undefined ? lowerFirst(problem.message) : friendly(text));
    const severity = problem.name === 'YAMLWarning' ? 'warning' : 'error';
    const position = locator.span(start, end);
    // One syntax error tends to set off a second on the same line; the first is the one to fix.
    if (severity === 'error' && linesWithErrors.has(position.line)) continue;
    if (severity === 'error') linesWithErrors.add(position.line);
    diagnostics.push(diagnostic('record/yaml', severity, message, { ...position, actual: problem.code }));
  }
  return diagnostics;
}

/** Parses YAML source; duplicate keys, unknown tags and alias bombs are diagnostics, not exceptions. */
export function parseRecordYaml(source: string): ParsedYaml {
  const lineCounter = new LineCounter();
  const doc = parseDocument(source, {
    lineCounter,
    prettyErrors: false,
    // `1:` and `'1':` are different YAML keys but the same field once read; treat them as duplicates.
    uniqueKeys: (a, b) => keyText(a) === keyText(b),
    logLevel: 'error',
  });
  const locator = createLocator(doc, lineCounter, source);
  const diagnostics = yamlDiagnostics(doc, source, locator);
  const { aliases, diagnostics: aliasDiagnostics } = findAliasProblems(doc, locator);
  diagnostics.push(...aliasDiagnostics, ...unusualTags(doc, locator));
  if (diagnostics.some((d) => d.severity === 'error')) return { doc, locator, diagnostics };
  try {
    const data: unknown = doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
    return { doc, locator, data, diagnostics };
  } catch (error) {
    // yaml does not say which alias overflowed; the first one is where the expansion starts.
    const first = aliases[0]?.range ?? [0, 0];
    const position = locator.span(first[0], first[1]);
    const excessive = error instanceof ReferenceError && /alias/i.test(error.message);
    const message = excessive
      ? `aliases expand to too many values (more than ${MAX_ALIAS_COUNT}); a record never needs this many`
      : `the YAML could not be read: ${lowerFirst(error instanceof Error ? error.message : String(error))}`;
    diagnostics.push(diagnostic('record/yaml', 'error', message, position));
    return { doc, locator, diagnostics };
  }
}
