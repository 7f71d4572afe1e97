/**
 * Text from a record inside an XML attribute or element. Markup characters become entities; the
 * characters XML 1.0 forbids outright (most C0 controls, lone surrogates, U+FFFE and U+FFFF;
 * not even `&#1;` is allowed) are written as visible escapes such as `\x1b`; tabs and line breaks
 * become character references so attribute values keep them.
 */

const FORBIDDEN =
  /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;

/** Escapes text for XML content and double- or single-quoted attribute values. */
export function xmlText(text: string): string {
  return text
    .replace(FORBIDDEN, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;')
    .replace(/\t/g, '&#9;')
    .replace(/\n/g, '&#10;')
    .replace(/\r/g, '&#13;');
}
