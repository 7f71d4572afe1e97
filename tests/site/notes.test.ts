import { describe, expect, it } from 'vitest';
import { renderNotes } from '../../src/site/notes.ts';

describe('renderNotes', () => {
  it('renders a paragraph of $$ … $$ on one line as display math', () => {
    const html = renderNotes('Before\n\n$$ r = \\frac{a}{b} $$\n\nafter, with $x$ inline.');
    expect(html.match(/class="katex-display"/g)).toHaveLength(1);
    expect(html.match(/class="katex"/g)).toHaveLength(2);
  });

  it('keeps $$ … $$ inside running text inline', () => {
    const html = renderNotes('so $$x$$ here');
    expect(html).not.toContain('katex-display');
    expect(html).toContain('class="katex"');
  });

  it('keeps no raw HTML and links only to http(s)', () => {
    const html = renderNotes(
      '<script>alert(1)</script>\n\n<img src=x onerror=alert(1)>\n\n[a](javascript:alert(1)) [b](https://example.org/)',
    );
    expect(html).not.toMatch(/<script|<img|onerror|javascript:/);
    expect(html).toContain('<a href="https://example.org/">b</a>');
  });

  it('renders math with trust off and sizes bounded', () => {
    const html = renderNotes('$\\href{javascript:alert(1)}{x}$ $\\rule{100000em}{1em}$');
    // The TeX source stays in the MathML annotation as text; no link is made of it.
    expect(html).not.toMatch(/<a[ >]|href=/);
    expect(html).toContain('border-right-width:10em');
  });
});
