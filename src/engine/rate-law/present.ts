/**
 * A rate law as people read it: the product of constants in front named k_obs (k_obs = k_2 K_1),
 * shown beside the full form. A solvent's concentration is constant: it stays visible in the
 * full law (so every term keeps its units) and is absorbed into k_obs with the constants.
 */
import { Monomial, Polynomial, RationalFunction } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import { rateCoefficientUnit, unitLatex, unitText, valueOf } from './apparent-constant.ts';
import type { Formatter } from './formatter.ts';
import type { TraceLine } from './rate-law.ts';
import { concentration, symbolMeaning } from './symbols.ts';

export interface PresentedLaw {
  /** the law, solvent concentrations included */
  expression: RationalFunction;
  text: string;
  latex: string;
  grouped?: {
    name: string;
    text: string;
    latex: string;
    valueText: string;
    valueLatex: string;
    /** the unit of k_obs (M and s), and its value where the constants are given */
    unitText: string;
    unitLatex: string;
    value?: number;
  };
  trace: TraceLine[];
}

/** Names the grouped constant; solvent concentrations count as constants. */
export function presentLaw(
  expression: RationalFunction,
  solvents: readonly string[],
  fmt: Formatter,
  values?: ReadonlyMap<string, number>,
): PresentedLaw {
  const trace: TraceLine[] = [];
  const shown = expression;
  const solventSymbols = new Set(solvents.map(concentration).filter((s) => shown.symbols().includes(s)));
  for (const symbol of solventSymbols) {
    trace.push({
      say: `${symbol.slice(1, -1)} is the solvent: its concentration is constant and belongs with the constants`,
      text: `${symbol} = const.`,
      latex: `${fmt.style.latex(symbol)} = \\text{const.}`,
    });
  }
  const out: PresentedLaw = { expression: shown, text: fmt.text(shown), latex: fmt.latex(shown), trace };
  const grouped = groupConstants(shown, (symbol) => isConstant(symbol) || solventSymbols.has(symbol));
  if (grouped) {
    const name = 'k_obs';
    const withName = RationalFunction.of(
      Polynomial.term(grouped.rest.coefficient, grouped.rest.monomial.mul(Monomial.of(name))),
      grouped.denominator,
    );
    // The rate is in M s⁻¹ and the rest of the law is concentrations over a dimensionless sum.
    const unit = rateCoefficientUnit(grouped.rest.monomial.totalDegree.sub(grouped.denominatorDegree));
    const value = values && valueOf(grouped.value, values);
    out.grouped = {
      name,
      text: fmt.text(withName),
      latex: fmt.latex(withName).replace(/k_obs/g, 'k_\\mathrm{obs}'),
      valueText: fmt.text(grouped.value),
      valueLatex: fmt.latex(grouped.value),
      unitText: unitText(unit),
      unitLatex: unitLatex(unit),
      ...(value !== undefined && { value }),
    };
    trace.push({
      say: 'grouped constant',
      text: `k_obs = ${out.grouped.valueText}`,
      latex: `k_\\mathrm{obs} = ${out.grouped.valueLatex}`,
    });
  }
  return out;
}

const isConstant = (symbol: string) => symbolMeaning(symbol)?.kind === 'constant';

/** Splits a one-term numerator (over a one-term or unit-led denominator) into constants × the rest. */
function groupConstants(f: RationalFunction, constant: (symbol: string) => boolean) {
  const [num] = f.numerator.terms;
  if (f.numerator.terms.length !== 1 || !num) return undefined;
  const den = f.denominator.terms;
  const single = den.length === 1 ? den[0] : undefined;
  if (!single && !den.some((t) => t.monomial.isOne())) return undefined;
  const constantPart = (m: Monomial) => Monomial.fromFactors(m.factors.filter(([s]) => constant(s)));
  const numConst = constantPart(num.monomial);
  const denConst = single ? constantPart(single.monomial) : Monomial.ONE;
  // A sum below reads from 1: a leading number other than 1 (a σ of 2, say) goes into k_obs.
  const lead = single ? single.coefficient : den.find((t) => t.monomial.isOne())!.coefficient;
  const coefficient = num.coefficient.div(lead);
  const factors = numConst.factors.length + denConst.factors.length;
  // A single constant needs no new name.
  if (factors === 0 || (factors === 1 && coefficient.equals(Rational.ONE))) return undefined;
  return {
    value: RationalFunction.of(Polynomial.term(coefficient, numConst), Polynomial.term(Rational.ONE, denConst)),
    rest: { coefficient: Rational.ONE, monomial: num.monomial.div(numConst) },
    denominator: single
      ? Polynomial.term(Rational.ONE, single.monomial.div(denConst))
      : f.denominator.scale(lead.inverse()),
    denominatorDegree: single ? single.monomial.div(denConst).totalDegree : Rational.ZERO,
  };
}
