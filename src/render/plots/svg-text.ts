/**
 * Small text helpers shared by the SVG plots: escaping user text, printing numbers the same way
 * every time (so output is byte-for-byte deterministic), and wrapping species lists.
 */
export { signedValue, speciesTerms } from '../words/index.ts';

/** Escapes text for an SVG text node or attribute value: & < > " '. */
export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/** A coordinate rounded to 0.1 px, without a trailing ".0" and never "-0". */
export function coordinate(x: number): string {
  const r = Math.round(x * 10) / 10;
  return String(r === 0 ? 0 : r);
}

/**
 * Wraps terms into lines of at most `maxChars`, breaking only between terms (continuation lines
 * start with "+ "); a term too long for a line, or lines beyond `maxLines`, are cut with "…".
 */
export function wrapTerms(
  terms: readonly string[],
  maxChars: number,
  maxLines: number,
): { lines: string[]; cut: boolean } {
  const width = Math.max(4, Math.floor(maxChars));
  const lines: string[] = [];
  let cut = false;
  for (const term of terms) {
    const last = lines[lines.length - 1];
    if (last !== undefined && last.length + 3 + term.length <= width) {
      lines[lines.length - 1] = `${last} + ${term}`;
      continue;
    }
    const prefix = lines.length === 0 ? '' : '+ ';
    const room = width - prefix.length;
    const piece = term.length <= room ? term : `${term.slice(0, Math.max(1, room - 1))}…`;
    if (piece !== term) cut = true;
    lines.push(prefix + piece);
  }
  if (lines.length > maxLines) {
    const kept = lines.slice(0, maxLines);
    const end = kept[maxLines - 1]!;
    kept[maxLines - 1] = end.length < width ? `${end} …` : `${end.slice(0, width - 1)}…`;
    return { lines: kept, cut: true };
  }
  return { lines, cut };
}
