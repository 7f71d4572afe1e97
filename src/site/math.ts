/**
 * KaTeX on the server: trust off (no \href, \url, \includegraphics…), strict, bounded sizes and
 * macro expansion, HTML + MathML for accessibility. A formula that does not parse is shown as
 * escaped text, never as raw HTML.
 */
import katex from 'katex';

const OPTIONS = {
  output: 'htmlAndMathml' as const,
  throwOnError: true,
  trust: false,
  strict: 'ignore' as const,
  maxSize: 10,
  maxExpand: 200,
};

/**
 * The most HTML one formula may become. A formula a few kilobytes long (deeply nested fractions,
 * long sums) can typeset to megabytes; above this it is shown as its source instead.
 */
export const MAX_MATH_HTML = 200_000;

/**
 * Formulas already typeset in this build, by display mode and source: the same species, constants
 * and laws appear on many pages, and KaTeX was a fifth of a warm build's time. Typesetting is
 * deterministic, so a remembered result is the same bytes. Bounded: cleared when it grows past
 * MEMO_LIMIT entries.
 */
const memo = new Map<string, string>();
const MEMO_LIMIT = 50_000;

/** HTML for a formula (inline unless `display`); too large to typeset, its source with a notice. */
export function renderMath(latex: string, display = false): string {
  const key = `${display ? 'D' : 'I'}${latex}`;
  const known = memo.get(key);
  if (known !== undefined) return known;
  if (memo.size >= MEMO_LIMIT) memo.clear();
  const html = typeset(latex, display);
  memo.set(key, html);
  return html;
}

function typeset(latex: string, display: boolean): string {
  let html: string;
  try {
    html = katex.renderToString(latex, { ...OPTIONS, displayMode: display });
  } catch {
    return `<code class="math-error">${escapeHtml(latex)}</code>`;
  }
  return html.length <= MAX_MATH_HTML ? html : mathTooLarge(latex);
}

/** A formula shown as its source, saying why it was not typeset. */
export function mathTooLarge(latex: string): string {
  const title = `not typeset: the formula would be more than ${MAX_MATH_HTML.toLocaleString('en')} characters of HTML`;
  return `<code class="math-too-large" title="${title}">${escapeHtml(latex)}</code>`;
}

/** Escapes text for HTML content and attribute values. */
export function escapeHtml(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}
