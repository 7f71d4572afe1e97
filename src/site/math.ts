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

/** HTML for a formula (inline unless `display`); too large to typeset, its source with a notice. */
export function renderMath(latex: string, display = false): string {
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
