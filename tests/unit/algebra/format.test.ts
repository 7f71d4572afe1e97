import fc from 'fast-check';
import katex from 'katex';
import { describe, expect, it } from 'vitest';
import {
  compareSymbols,
  formatLatex,
  formatText,
  Monomial,
  Polynomial,
  RationalFunction,
  type Expression,
  type SymbolStyle,
} from '../../../src/engine/exact/index.ts';
import { arbGeneralPolynomial, arbNonZeroPolynomial, poly, q, rf } from './helpers.ts';

const TEXT: Record<string, string> = { S: '[S]', ET: '[E]_T', O2: '[O2]', NO: '[NO]', km1: 'k_-1', I: '[I-]' };
const LATEX: Record<string, string> = {
  S: '[\\mathrm{S}]',
  ET: '[\\mathrm{E}]_\\mathrm{T}',
  O2: '[\\mathrm{O_2}]',
  NO: '[\\mathrm{NO}]',
  k1: 'k_{1}',
  k2: 'k_{2}',
  km1: 'k_{-1}',
  Fe: '[\\mathrm{Fe}^{3+}]',
  Fe3: '\\mathrm{Fe}^{3+}',
};
/** Rate constants before concentrations, as a chemist writes them. */
const chemical: SymbolStyle = {
  text: (s) => TEXT[s] ?? s,
  latex: (s) => LATEX[s] ?? s,
  compare: (a, b) => Number(!a.startsWith('k')) - Number(!b.startsWith('k')) || compareSymbols(a, b),
};

const cases: [string, Expression, string, string][] = [
  [
    'Michaelis–Menten rate',
    rf('k1*k2*S*ET/(km1 + k2 + k1*S)'),
    'k1*k2*[E]_T*[S] / (k1*[S] + k2 + k_-1)',
    '\\frac{k_{1} k_{2} [\\mathrm{E}]_\\mathrm{T} [\\mathrm{S}]}{k_{1} [\\mathrm{S}] + k_{2} + k_{-1}}',
  ],
  [
    'half and negative orders',
    poly('k*O2^(1/2)/NO'),
    'k*[O2]^(1/2)/[NO]',
    '\\frac{k [\\mathrm{O_2}]^{1/2}}{[\\mathrm{NO}]}',
  ],
  ['fractional coefficient', poly('3/2*x^2 - y + 1'), '3*x^2/2 - y + 1', '\\frac{3 x^{2}}{2} - y + 1'],
  ['negative single-term numerator', rf('-x/(1 + y)'), '-x / (y + 1)', '-\\frac{x}{y + 1}'],
  ['product in the denominator', rf('x/(2*y)'), 'x / (2*y)', '\\frac{x}{2 y}'],
  ['two-term numerator', rf('(x + 1)/y'), '(x + 1) / y', '\\frac{x + 1}{y}'],
  ['constant denominator', rf('x/2 + y'), 'x/2 + y', '\\frac{x}{2} + y'],
  ['several negative powers', poly('1/(x*y^2)'), '1/(x*y^2)', '\\frac{1}{x y^{2}}'],
  ['a bare monomial', Monomial.fromFactors([['x', -2]]), '1/x^2', '\\frac{1}{x^{2}}'],
  ['one', Monomial.ONE, '1', '1'],
  ['zero', Polynomial.ZERO, '0', '0'],
  ['zero function', RationalFunction.ZERO, '0', '0'],
  ['operator characters bracketed before a power', poly('km1^2*k1'), 'k1*(k_-1)^2', 'k_{1} k_{-1}^{2}'],
  ['but not inside brackets', poly('I^2'), '[I-]^2', 'I^{2}'],
  [
    'a charge superscript braced before a power',
    poly('Fe3^2*Fe^2'),
    'Fe^2*Fe3^2',
    '{[\\mathrm{Fe}^{3+}]}^{2} {\\mathrm{Fe}^{3+}}^{2}',
  ],
];

describe('formatText and formatLatex', () => {
  it.each(cases)('%s', (_, value, text, latex) => {
    expect(formatText(value, chemical)).toBe(text);
    expect(formatLatex(value, chemical)).toBe(latex);
  });

  it('prints raw symbols in code-unit order by default', () => {
    expect(formatText(poly('b*a + B'))).toBe('a*b + B');
    expect(formatLatex(poly('k_1*x^(3/2)'))).toBe('k_1 x^{3/2}');
  });

  it('is deterministic whatever order the terms were built in', () => {
    const p = Polynomial.fromTerms([
      { coefficient: q(1), monomial: Monomial.of('y') },
      { coefficient: q(2), monomial: Monomial.of('x') },
    ]);
    expect(formatText(p)).toBe(formatText(poly('2*x + y')));
  });

  it('always produces LaTeX that KaTeX accepts', () => {
    const arbExpression = fc.oneof(
      arbGeneralPolynomial,
      fc.tuple(arbGeneralPolynomial, arbNonZeroPolynomial).map(([n, d]) => RationalFunction.of(n, d)),
    );
    // Subscripted and superscripted symbols are the ones that could break a power or a fraction.
    const hard: SymbolStyle = { text: (s) => s, latex: (s) => ({ x: LATEX.ET!, y: LATEX.Fe3!, z: 'k_{-1}' })[s] ?? s };
    fc.assert(
      fc.property(arbExpression, (value) => {
        expect(() => katex.renderToString(formatLatex(value, hard), { throwOnError: true })).not.toThrow();
      }),
      { numRuns: 40 },
    );
  });
});
