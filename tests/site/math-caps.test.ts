/**
 * Typeset math has a size cap: nested fractions or a long sum a few kilobytes long would make a
 * page of megabytes. Above the cap a formula is shown as its source, with a notice, never as
 * raw HTML; below it, it is typeset as before.
 */
import { describe, expect, it } from 'vitest';
import { MAX_MATH_HTML, renderMath } from '../../src/site/math.ts';
import { renderNotes } from '../../src/site/notes.ts';

const nested = (depth: number) => '\\frac{'.repeat(depth) + 'x' + '}{y}'.repeat(depth);

describe('the size cap on typeset math', () => {
  it('typesets an ordinary formula and shows an oversized one as escaped source', () => {
    expect(renderMath(nested(3))).toContain('class="katex"');
    const sum = 'x_{<1>}+'.repeat(3000) + 'y';
    const html = renderMath(sum);
    expect(html.startsWith('<code class="math-too-large" title="not typeset')).toBe(true);
    expect(html).toContain('x_{&lt;1&gt;}+');
    expect(html.length).toBeLessThan(sum.length * 2);
  });

  it('keeps a note of many large formulas to a bounded page', { timeout: 60_000 }, () => {
    // Seven formulas of about 165 KB of HTML each: each under the cap per formula, over the cap for a note.
    const note = Array.from({ length: 7 }, () => `$${nested(170)}$`).join('\n\n');
    expect(note.length).toBeLessThan(20_000);
    const html = renderNotes(note);
    expect(html.length).toBeLessThan(1_000_000 + (20 * MAX_MATH_HTML) / 10);
    expect(html).toContain('class="katex"');
    expect(html).toContain('class="math-too-large"');
    expect(html).toContain('the formulas of these notes would be more than 1,000,000 characters');
  });

  it('shows a single formula over the cap as its source in the notes', () => {
    const html = renderNotes(`Before $${'x+'.repeat(2500)}y$ after.`);
    expect(html).toMatch(/<code class="math-too-large" title="not typeset: this formula would be [\d,]+ characters/);
    expect(html).not.toContain('class="katex"');
  });
});
