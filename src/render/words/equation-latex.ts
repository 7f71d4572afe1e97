/**
 * Equations as LaTeX for KaTeX: each species through speciesLatex (which lets no user text
 * become a command), coefficients before their species. A step gets its one-way or reversible
 * arrow (the text is read by the engine's own parser, so the page shows exactly what was
 * derived); the overall equation gets its catalysts over the arrow.
 */
import { parseEquation, type Term } from '../../engine/index.ts';
import { Rational } from '../../engine/index.ts';
import { speciesLatex } from '../../engine/index.ts';

/** `2 NO + O2 -> 2 NO2` → `2\,\mathrm{NO} + \mathrm{O_{2}} \rightarrow 2\,\mathrm{NO_{2}}`; undefined when it does not parse. */
export function equationLatex(equation: string): string | undefined {
  const parsed = parseEquation(equation);
  if ('error' in parsed) return undefined;
  const { reactants, products, reversible } = parsed.equation;
  const arrow = reversible ? '\\rightleftharpoons' : '\\rightarrow';
  return `${sideLatex(reactants)} ${arrow} ${sideLatex(products)}`;
}

/** `2\,\mathrm{H_2O_2} \xrightarrow{\mathrm{I^-}} 2\,\mathrm{H_2O} + \mathrm{O_2}`: catalysts over the arrow. */
export function overallLatex(
  reactants: ReadonlyMap<string, Rational>,
  products: ReadonlyMap<string, Rational>,
  catalysts: readonly string[],
): string {
  const arrow =
    catalysts.length > 0 ? `\\xrightarrow{${catalysts.map(speciesLatex).join(',\\,')}}` : '\\longrightarrow';
  return `${sideLatex([...reactants].map(([species, coefficient]) => ({ species, coefficient })))} ${arrow} ${sideLatex([...products].map(([species, coefficient]) => ({ species, coefficient })))}`;
}

function sideLatex(terms: readonly Pick<Term, 'species' | 'coefficient'>[]): string {
  if (terms.length === 0) return '\\varnothing';
  return terms
    .map(
      (t) => `${t.coefficient.equals(Rational.ONE) ? '' : `${t.coefficient.toString()}\\,`}${speciesLatex(t.species)}`,
    )
    .join(' + ');
}

/** The LaTeX of a grouped constant's name (`k_obs` → `k_\mathrm{obs}`). */
export function constantNameLatex(name: string): string {
  const m = /^([A-Za-z])_([A-Za-z0-9]+)$/.exec(name);
  return m ? `${m[1]}_\\mathrm{${m[2]}}` : `\\mathrm{${name.replace(/[^A-Za-z0-9]/g, '')}}`;
}
