/**
 * A record's layout made regular, every value and comment kept: fields in the schema's order,
 * two-space indentation, one blank line at most where the author left one, strings quoted only
 * where YAML needs it, numbers, dates and block text exactly as written. The result is read back
 * and must hold the same data and the same comments; otherwise nothing is returned, and a file
 * that does not read as YAML gets its positioned `record/yaml` diagnostics instead.
 */
import { isDeepStrictEqual } from 'node:util';
import { isMap, isScalar, isSeq, parseDocument, Scalar, visit, type Document, type Node } from 'yaml';
import type { CollectionTag, ScalarTag, YAMLMap, YAMLSeq } from 'yaml';
import { diagnostic, type Diagnostic } from '../model/index.ts';
import { parseRecordYaml } from './parse-record-yaml.ts';
import { itemSchema, mappingSchema, RECORD_SCHEMA, type SchemaNode } from './schema-key-order.ts';
import { keyText } from './source-positions.ts';

/** The formatted text, or the diagnostics that say why the file is left as it is. */
export interface FormattedRecord {
  text?: string;
  diagnostics: Diagnostic[];
}

// Numbers, booleans and nulls are printed as their source wrote them (`1.0e-3` stays, not 0.001).
function scalarAsWritten(tag: ScalarTag): ScalarTag {
  return {
    ...tag,
    stringify: (item, ctx, onComment, onChompKeep) => {
      const source = (item as Scalar).source;
      if (typeof source === 'string' && source !== '') return source;
      return tag.stringify ? tag.stringify(item, ctx, onComment, onChompKeep) : String((item as Scalar).value);
    },
  };
}

// Flow mappings with spaces inside the braces, flow lists without: `{ name: iodide }`, `[aqueous, halide]`.
function flowPadding(tag: CollectionTag): CollectionTag {
  const padding = tag.collection === 'map' ? ' ' : '';
  type Context = Parameters<YAMLMap['toString']>[0];
  // yaml's types leave `stringify` off collection tags, but its stringifier calls one where present.
  const stringify = (node: YAMLMap | YAMLSeq, ctx: Context, onComment?: () => void, onChompKeep?: () => void) =>
    node.toString({ ...ctx!, flowCollectionPadding: padding } as Context, onComment, onChompKeep);
  return { ...tag, stringify } as unknown as CollectionTag;
}

// Folded text (`>`) is folded again at this width; nothing else is ever folded (a long title stays on its line).
const FOLD_WIDTH = 100;

function stringAsFolded(tag: ScalarTag): ScalarTag {
  return {
    ...tag,
    stringify: (item, ctx, onComment, onChompKeep) => {
      const lineWidth = (item as Scalar).type === Scalar.BLOCK_FOLDED ? FOLD_WIDTH : 0;
      const options = { ...ctx.options, lineWidth };
      return tag.stringify!(item, { ...ctx, options }, onComment, onChompKeep);
    },
  };
}

function layoutTags(tags: (ScalarTag | CollectionTag)[]): (ScalarTag | CollectionTag)[] {
  return tags.map((tag) => {
    if ('collection' in tag && tag.collection) return flowPadding(tag as CollectionTag);
    return tag.tag === 'tag:yaml.org,2002:str' ? stringAsFolded(tag as ScalarTag) : scalarAsWritten(tag as ScalarTag);
  });
}

function parse(source: string): Document.Parsed {
  return parseDocument(source, {
    prettyErrors: false,
    uniqueKeys: (a, b) => keyText(a) === keyText(b),
    logLevel: 'error',
    customTags: (tags) => layoutTags(tags as (ScalarTag | CollectionTag)[]),
  });
}

/** Puts each mapping's fields in the schema's order (unknown fields after, as written) and lets YAML choose quotes. */
function normalise(node: unknown, schema: SchemaNode | undefined): void {
  if (isMap(node)) {
    const { order, field } = mappingSchema(schema);
    const rank = (key: string) => {
      const i = order.indexOf(key);
      return i < 0 ? order.length : i;
    };
    const keyed = node.items.map((pair, i) => ({ pair, i, key: isScalar(pair.key) ? keyText(pair.key) : '' }));
    keyed.sort((a, b) => rank(a.key) - rank(b.key) || a.i - b.i);
    node.items = keyed.map((k) => k.pair);
    for (const { pair, key } of keyed) {
      unquote(pair.key);
      normalise(pair.value, field(key));
    }
  } else if (isSeq(node)) {
    for (const item of node.items) normalise(item, itemSchema(schema));
  } else unquote(node);
}

/** A quoted string on one line loses its quotes where it reads the same without them. */
function unquote(node: unknown): void {
  if (!isScalar(node) || typeof node.value !== 'string' || node.value.includes('\n')) return;
  if (node.type === Scalar.QUOTE_DOUBLE || node.type === Scalar.QUOTE_SINGLE) delete node.type;
}

/** Every comment of a document, in order, for the check that none is lost. */
function comments(doc: Document): string[] {
  const out: string[] = [];
  const add = (text: string | null | undefined) => {
    if (text)
      out.push(
        ...text
          .split('\n')
          .map((line) => line.trim())
          .filter(Boolean),
      );
  };
  add(doc.commentBefore);
  visit(doc, {
    Node(_key, node: Node) {
      add(node.commentBefore);
      add(node.comment);
    },
  });
  add(doc.comment);
  return out.sort();
}

/** Formats a record's YAML text; a text that does not parse, or whose data would change, is not formatted. */
export function formatRecordText(source: string, file?: string): FormattedRecord {
  const parsed = parseRecordYaml(source);
  const errors = parsed.diagnostics.filter((d) => d.severity === 'error');
  const place = (d: Diagnostic) => (file === undefined ? d : { ...d, file });
  if (errors.length > 0 || parsed.data === undefined) return { diagnostics: errors.map(place) };
  const doc = parse(source);
  // A file that is not a mapping (empty, a list, a lone value) is not a record to lay out.
  if (!isMap(doc.contents)) return { text: source, diagnostics: [] };
  keepHeaderComment(doc as Document & { contents: YAMLMap });
  // An alias must come after its anchor: where the record uses them, fields keep their order.
  normalise(doc.contents, hasAliases(doc) ? undefined : RECORD_SCHEMA);
  let text: string;
  try {
    text = doc.toString({ indent: 2, indentSeq: true, lineWidth: 0, minContentWidth: 0 });
  } catch (error) {
    return { diagnostics: [place(notFormatted(error instanceof Error ? error.message : String(error)))] };
  }
  const again = parseRecordYaml(text);
  const same =
    again.data !== undefined &&
    isDeepStrictEqual(again.data, parsed.data) &&
    isDeepStrictEqual(comments(parse(text)), comments(parse(source)));
  if (same) return { text, diagnostics: [] };
  return { diagnostics: [place(notFormatted('the data or comments would change'))] };
}

/** The record would not survive formatting unchanged: a fault of fmt, reported as such, and the file left alone. */
function notFormatted(why: string): Diagnostic {
  const message = `formatting would change what this record holds (${why}), so it is left as written`;
  const note = 'a fault in mechatlas fmt, not in the record: please report it with this file';
  return diagnostic('internal/failure', 'error', message, { line: 1, column: 1, note });
}

/** The comment above the first field heads the file: it stays at the top when that field moves. */
function keepHeaderComment(doc: Document & { contents: YAMLMap }): void {
  const first = doc.contents.items[0]?.key;
  if (!isScalar(first) || !first.commentBefore) return;
  const map = doc.contents;
  map.commentBefore = map.commentBefore ? `${map.commentBefore}\n${first.commentBefore}` : first.commentBefore;
  delete first.commentBefore;
}

/** True when the document holds an alias (`*name`). */
function hasAliases(doc: Document): boolean {
  let found = false;
  visit(doc, {
    Alias() {
      found = true;
      return visit.BREAK;
    },
  });
  return found;
}
