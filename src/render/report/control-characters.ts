/**
 * Text from a record printed to a terminal or a log: control characters (an escape sequence can
 * move the cursor and rewrite the line, a carriage return can hide what came before) and the
 * invisible bidirectional controls (they reorder what a reader sees) are shown as escapes, so
 * what is printed is what the record says.
 */

// C0 controls but tab, DEL, C1 controls, and the bidirectional embedding, override and isolate marks.
const UNSAFE = /[\u0000-\u0008\u000a-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;

/**
 * `\x1b`, `\n`, `\u202e`: each unsafe character as a visible escape; everything else unchanged.
 * With `keepNewlines`, line breaks stay (for text of several lines, such as a derivation).
 */
export function escapeControlCharacters(text: string, keepNewlines = false): string {
  return text.replace(UNSAFE, (c) => {
    const code = c.charCodeAt(0);
    if (c === '\n') return keepNewlines ? c : '\\n';
    if (c === '\r') return '\\r';
    return code <= 0xff ? `\\x${code.toString(16).padStart(2, '0')}` : `\\u${code.toString(16).padStart(4, '0')}`;
  });
}
