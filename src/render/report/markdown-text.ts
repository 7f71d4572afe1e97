/**
 * Record text made inert for a pull-request comment: no image, link, emphasis, math, mention,
 * issue reference or HTML is formed from what a record says, and nothing breaks the table or
 * the collapsible section it sits in. Markdown text and raw HTML (a `<summary>` line, where
 * markdown is not read) each have their own escaping.
 */
import { escapeControlCharacters } from './control-characters.ts';

// What GitHub would turn into a notification or a link: @-mentions, web addresses, issue numbers.
const LIVE = /(@[A-Za-z0-9][\w./-]*|(?:https?|ftp|mailto|file|data|javascript):\S*|www\.\S+|#\d+)/i;

/** Text on one line with its control characters shown. */
function oneLine(text: string): string {
  return escapeControlCharacters(text.replace(/\r?\n/g, ' '));
}

/**
 * Record text for markdown (a table cell or a list item): markdown punctuation and HTML escaped,
 * mentions and addresses put in code spans (no one is notified, nothing is fetched), one line.
 */
export function cell(text: string): string {
  return oneLine(text)
    .split(LIVE)
    .map((part, i) => (i % 2 === 1 ? codeSpan(part) : escapeMarkdown(part)))
    .join('');
}

/** A backslash before the marks that form links, images, emphasis, math and cells; HTML's characters as entities. */
function escapeMarkdown(text: string): string {
  return text
    .replace(/[\\`*_[\]~|$]/g, (c) => `\\${c}`)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;');
}

/** A code span that holds any text: a fence longer than its longest run of backticks, pipes escaped for the table. */
export function codeSpan(text: string): string {
  const line = oneLine(text);
  const longest = Math.max(0, ...[...line.matchAll(/`+/g)].map((m) => m[0].length));
  const fence = '`'.repeat(longest + 1);
  const pad = line.startsWith('`') || line.endsWith('`') ? ' ' : '';
  return `${fence}${pad}${line.replace(/\|/g, '\\|')}${pad}${fence}`;
}

/** HTML's special characters, and the dollar of math, as character references. */
function escapeHtml(text: string): string {
  return text.replace(/[&<>"'$]/g, (c) => `&#${c.charCodeAt(0)};`);
}

/**
 * Record text for raw HTML, such as a `<summary>` line, where markdown is not read: escaped as
 * HTML, mentions, addresses and issue numbers inside `<code>` (where they stay text), one line.
 */
export function inlineHtml(text: string): string {
  return oneLine(text)
    .split(LIVE)
    .map((part, i) => (i % 2 === 1 ? `<code>${escapeHtml(part)}</code>` : escapeHtml(part)))
    .join('');
}
