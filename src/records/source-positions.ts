/**
 * Turns a path into the record (`['steps', 1, 'k']`) into the line and column where it is written,
 * so schema errors and engine diagnostics alike point at the source. Offsets become lines and
 * columns in one place: the yaml LineCounter filled while parsing.
 */
import { isAlias, isMap, isScalar, isSeq, Scalar } from 'yaml';
import type { Document, LineCounter } from 'yaml';
import type { RecordPath } from '../model/index.ts';

/** A span of the source, 1-based; the end is exclusive (the column after the last character). */
export interface SourcePosition {
  line: number;
  column: number;
  endLine: number;
  endColumn: number;
}

/** Finds where parts of one parsed record are written. */
export interface RecordLocator {
  /** The value at `path`, or the nearest ancestor that exists; `offset` moves into a one-line string. */
  locate(path: RecordPath, offset?: number): SourcePosition;
  /** The key that names the last segment of `path` (a field name), or the nearest ancestor. */
  locateKey(path: RecordPath): SourcePosition;
  /** A span given as character offsets into the source. */
  span(start: number, end?: number): SourcePosition;
}

/** A YAML key as the record sees it after `toJS` (which turns every key into a string). */
export function keyText(key: unknown): string {
  if (isScalar(key)) return key.value === null ? '' : String(key.value);
  return String(key);
}

interface Found {
  node: unknown;
  key: unknown;
  complete: boolean;
}

function find(doc: Document.Parsed, path: RecordPath): Found {
  let node: unknown = doc.contents;
  let key: unknown;
  for (const segment of path) {
    if (isMap(node)) {
      const pair = node.items.find((item) => keyText(item.key) === String(segment));
      if (pair === undefined) return { node, key, complete: false };
      key = pair.key;
      node = pair.value ?? pair.key;
    } else if (isSeq(node)) {
      const index = typeof segment === 'number' ? segment : /^\d+$/.test(segment) ? Number(segment) : -1;
      const item: unknown = node.items[index];
      if (item === undefined) return { node, key, complete: false };
      key = item;
      node = item;
    } else {
      // Scalars have no children; an alias is reported where it is written, not at its anchor.
      return { node, key, complete: false };
    }
  }
  return { node, key, complete: true };
}

function rangeOf(node: unknown): readonly [number, number] | undefined {
  if (typeof node !== 'object' || node === null || !('range' in node)) return undefined;
  const range = (node as { range?: readonly number[] | null }).range;
  const [start, end] = range ?? [];
  return start === undefined || end === undefined ? undefined : [start, end];
}

/**
 * How many source characters precede value character `offset` inside a one-line scalar, counting
 * the opening quote and escapes (`''`, `\"`, `\u00e9`); undefined for block scalars.
 */
export function sourceShift(raw: string, type: Scalar['type'], offset: number): number | undefined {
  if (type === Scalar.PLAIN || type === undefined) return offset;
  if (type !== Scalar.QUOTE_SINGLE && type !== Scalar.QUOTE_DOUBLE) return undefined;
  let i = 1;
  let units = 0;
  while (units < offset && i < raw.length - 1) {
    if (type === Scalar.QUOTE_SINGLE) {
      i += raw[i] === "'" && raw[i + 1] === "'" ? 2 : 1;
      units += 1;
      continue;
    }
    if (raw[i] !== '\\') {
      i += 1;
      units += 1;
      continue;
    }
    const escape = raw[i + 1];
    const length = escape === 'x' ? 4 : escape === 'u' ? 6 : escape === 'U' ? 10 : 2;
    const codePoint = escape === 'U' ? Number.parseInt(raw.slice(i + 2, i + 10), 16) : 0;
    i += length;
    units += codePoint > 0xffff ? 2 : 1;
  }
  return i;
}

/** Builds a locator over a parsed document; without one, every path resolves to line 1. */
export function createLocator(
  doc: Document.Parsed | undefined,
  lineCounter: LineCounter,
  source: string,
): RecordLocator {
  const point = (offset: number): { line: number; column: number } => {
    const { line, col } = lineCounter.linePos(offset);
    return line === 0 ? { line: 1, column: offset + 1 } : { line, column: col };
  };
  const span = (start: number, end = start): SourcePosition => {
    let last = Math.max(start, end);
    // Block collections own the newline after their last line; the span should stop at the text.
    while (last > start && /\s/.test(source[last - 1] ?? '')) last -= 1;
    const from = point(start);
    const to = point(last);
    return { line: from.line, column: from.column, endLine: to.line, endColumn: to.column };
  };
  const spanOfNode = (node: unknown): SourcePosition => {
    const range = rangeOf(node);
    return range === undefined ? span(0) : span(range[0], range[1]);
  };
  const locate = (path: RecordPath, offset?: number): SourcePosition => {
    if (doc === undefined) return span(0);
    const { node, complete } = find(doc, path);
    const position = spanOfNode(node);
    const range = rangeOf(node);
    if (offset === undefined || !complete || !isScalar(node) || range === undefined) return position;
    if (position.line !== position.endLine) return position;
    const shift = sourceShift(source.slice(range[0], range[1]), node.type, offset);
    if (shift === undefined) return position;
    return { ...position, column: Math.min(position.column + shift, position.endColumn) };
  };
  const locateKey = (path: RecordPath): SourcePosition => {
    if (doc === undefined) return span(0);
    const { node, key, complete } = find(doc, path);
    return spanOfNode(complete && key !== undefined ? key : node);
  };
  return { locate, locateKey, span };
}
