import { describe, expect, it } from 'vitest';
import { renderMath } from '../../src/site/math.ts';
import { equationLatex } from '../../src/render/words/equation-latex.ts';

describe('equationLatex', () => {
  const cases: [equation: string, latex: string][] = [
    [
      'H2O2 + I- -> H2O + IO-',
      '\\mathrm{H_{2}O_{2}} + \\mathrm{I^{-}} \\rightarrow \\mathrm{H_{2}O} + \\mathrm{IO^{-}}',
    ],
    ['2 NO2 -> NO3 + NO', '2\\,\\mathrm{NO_{2}} \\rightarrow \\mathrm{NO_{3}} + \\mathrm{NO}'],
    ['2NO + O2 -> 2 NO2', '2\\,\\mathrm{NO} + \\mathrm{O_{2}} \\rightarrow 2\\,\\mathrm{NO_{2}}'],
    ['E + S <=> ES', '\\mathrm{E} + \\mathrm{S} \\rightleftharpoons \\mathrm{ES}'],
    ['Cat + A ⇌ CatA', '\\mathrm{Cat} + \\mathrm{A} \\rightleftharpoons \\mathrm{CatA}'],
    ['Fe3+ + e- → Fe2+', '\\mathrm{Fe^{3+}} + \\mathrm{e^{-}} \\rightarrow \\mathrm{Fe^{2+}}'],
    ['Cl2 + M -> 2 Cl• + M', '\\mathrm{Cl_{2}} + \\mathrm{M} \\rightarrow 2\\,\\mathrm{Cl^{\\bullet}} + \\mathrm{M}'],
    // The same species twice on one side is merged by the parser, as the engine reads it.
    ['A + A -> A2', '2\\,\\mathrm{A} \\rightarrow \\mathrm{A_{2}}'],
  ];
  it.each(cases)('%s', (equation, latex) => {
    expect(equationLatex(equation)).toBe(latex);
  });

  it('gives undefined for an equation that does not parse', () => {
    expect(equationLatex('A = B')).toBeUndefined();
    expect(equationLatex('A + -> B')).toBeUndefined();
  });

  it('lets no user text become a LaTeX command', () => {
    const latex = equationLatex('\\href{javascript:alert(1)}{x} + "><svg -> B')!;
    expect(latex).not.toMatch(/\\href/);
    const html = renderMath(latex);
    expect(html).toContain('class="katex"');
    expect(html).not.toMatch(/<a\b|javascript:|<svg onload/i);
  });

  it('renders every demo-style equation with KaTeX without error', () => {
    for (const [equation] of cases) expect(renderMath(equationLatex(equation)!)).not.toContain('math-error');
  });
});
