/**
 * A step equation as LaTeX for KaTeX: each species through speciesLatex (which lets no user text
 * become a command), coefficients before their species, and the one-way or reversible arrow.
 * The equation is read by the engine's own parser, so the page shows exactly what was derived.
 */
import { parseEquation, type Term } from '../engine/equation.ts';
import { Rational } from '../engine/rational.ts';
import { speciesLatex } from '../engine/rate-law/species-latex.ts';

/** `2 NO + O2 -> 2 NO2` → `2\,\mathrm{NO} + \mathrm{O_{2}} \rightarrow 2\,\mathrm{NO_{2}}`; undefined when it does not parse. */
export function equationLatex(equation: string): string | undefined {
  const parsed = parseEquation(equation);
  if ('error' in parsed) return undefined;
  const { reactants, products, reversible } = parsed.equation;
  const arrow = reversible ? '\\rightleftharpoons' : '\\rightarrow';
  return `${sideLatex(reactants)} ${arrow} ${sideLatex(products)}`;
}

function sideLatex(terms: readonly Term[]): string {
  return terms.map((t) => `${t.coefficient.equals(Rational.ONE) ? '' : `${t.coefficient.toString()}\\,`}${speciesLatex(t.species)}`).join(' + ');
}
