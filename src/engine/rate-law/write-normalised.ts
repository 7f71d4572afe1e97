/**
 * A normalised law written out: the numerator over each factor in parentheses with its power,
 * k_obs[A][B][S]_T² / (1 + K_A[A] + K_B[B])², in text and LaTeX. Apparent constants are written
 * with their own LaTeX names and read as constants (before the concentrations, and a denominator
 * still reads from its 1 upwards).
 */
import { formatLatex, formatText, Monomial, Polynomial, type Expression, type SymbolStyle } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import type { Formatter } from './formatter.ts';
import type { NormalisedTerm } from './normalised-law.ts';
import { symbolMeaning } from './symbols.ts';

/** Text and LaTeX writers that know the apparent constants' names. */
export interface NamedWriter {
  text(e: Expression): string;
  latex(e: Expression): string;
}

/** A writer in which the given names (in this order) are constants with the given LaTeX. */
export function namedWriter(fmt: Formatter, names: readonly { name: string; latex: string }[]): NamedWriter {
  const latexOf = new Map(names.map((n) => [n.name, n.latex]));
  const rank = (s: string) => {
    const i = names.findIndex((n) => n.name === s);
    return i < 0 ? names.length : i;
  };
  const isConstant = (s: string) => latexOf.has(s) || symbolMeaning(s)?.kind === 'constant';
  const style: SymbolStyle = {
    text: (s) => s,
    latex: (s) => latexOf.get(s) ?? fmt.style.latex(s),
    compare: (a, b) => rank(a) - rank(b) || (fmt.style.compare?.(a, b) ?? (a < b ? -1 : a > b ? 1 : 0)),
    // A sum reads from its 1 up, whatever the sign of the powers: 1 + K[O3]/[O2].
    termWeight: (m) => m.factors.reduce((n, [s, e]) => (isConstant(s) ? n : n + Math.abs(e.toNumber())), 0),
  };
  return { text: (e) => formatText(e, style), latex: (e) => formatLatex(e, style) };
}

/** The terms as one polynomial in named constants and concentrations. */
export function termsPolynomial(terms: readonly NormalisedTerm[]): Polynomial {
  return Polynomial.sum(
    terms.map((t) =>
      Polynomial.term(
        Rational.of(t.sign),
        t.constant === undefined ? t.concentrations : Monomial.of(t.constant, t.power).mul(t.concentrations),
      ),
    ),
  );
}

/** Writes numerator / Π (factor)^power in text and LaTeX. */
export function writeNormalised(
  numerator: readonly NormalisedTerm[],
  factors: readonly { terms: NormalisedTerm[]; power: number }[],
  names: readonly { name: string; latex: string }[],
  fmt: Formatter,
): { text: string; latex: string } {
  const w = namedWriter(fmt, names);
  const top = termsPolynomial(numerator);
  if (factors.length === 0) return { text: w.text(top), latex: w.latex(top) };
  const below = factors.map((f) => ({ p: termsPolynomial(f.terms), power: f.power }));
  const topText = numerator.length > 1 ? `(${w.text(top)})` : w.text(top);
  const belowText = below.map((f) => `(${w.text(f.p)})${f.power > 1 ? `^${f.power}` : ''}`).join('*');
  const belowLatex = below
    .map((f) => `\\left(${w.latex(f.p)}\\right)${f.power > 1 ? `^{${f.power}}` : ''}`)
    .join(below.length > 1 ? ' ' : '');
  const bare = below.length === 1 && below[0]!.power === 1;
  return {
    text: `${topText} / ${belowText}`,
    latex: `\\frac{${w.latex(top)}}{${bare ? w.latex(below[0]!.p) : belowLatex}}`,
  };
}
