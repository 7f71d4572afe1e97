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

/** HTML for a formula (inline unless `display`). */
export function renderMath(latex: string, display = false): string {
  try {
    return katex.renderToString(latex, { ...OPTIONS, displayMode: display });
  } catch {
    return `<code class="math-error">${escapeHtml(latex)}</code>`;
  }
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
