/**
 * A rate law as people read it: solvent concentrations absorbed into the constants, and the
 * product of constants in front named k_obs (k_obs = k_2 K_1), shown beside the full form.
 */
import { Monomial, Polynomial, RationalFunction } from '../algebra/index.ts';
import { Rational } from '../rational.ts';
import type { Formatter } from './formatter.ts';
import type { TraceLine } from './rate-law.ts';
import { concentration, symbolMeaning } from './symbols.ts';

export interface PresentedLaw {
  /** the law with solvents absorbed */
  expression: RationalFunction;
  text: string;
  latex: string;
  grouped?: { name: string; text: string; latex: string; valueText: string; valueLatex: string };
  trace: TraceLine[];
}

/** Absorbs the solvents and names the grouped constant. */
export function presentLaw(expression: RationalFunction, solvents: readonly string[], fmt: Formatter): PresentedLaw {
  const trace: TraceLine[] = [];
  let shown = expression;
  for (const solvent of solvents) {
    const symbol = concentration(solvent);
    if (!shown.symbols().includes(symbol)) continue;
    shown = RationalFunction.of(shown.numerator.substitute(symbol, Polynomial.ONE), shown.denominator.substitute(symbol, Polynomial.ONE));
    trace.push({ say: `${solvent} is the solvent: its constant concentration is absorbed into the constants`, text: `${symbol} = const.`, latex: `${fmt.style.latex(symbol)} = \\text{const.}` });
  }
  const out: PresentedLaw = { expression: shown, text: fmt.text(shown), latex: fmt.latex(shown), trace };
  const grouped = groupConstants(shown);
  if (grouped) {
    const name = 'k_obs';
    const withName = RationalFunction.of(Polynomial.term(grouped.rest.coefficient, grouped.rest.monomial.mul(Monomial.of(name))), grouped.denominator);
    out.grouped = {
      name,
      text: fmt.text(withName),
      latex: fmt.latex(withName).replace(/k_obs/g, 'k_\\mathrm{obs}'),
      valueText: fmt.text(grouped.value),
      valueLatex: fmt.latex(grouped.value),
    };
    trace.push({ say: 'grouped constant', text: `k_obs = ${out.grouped.valueText}`, latex: `k_\\mathrm{obs} = ${out.grouped.valueLatex}` });
  }
  return out;
}

const isConstant = (symbol: string) => symbolMeaning(symbol)?.kind === 'constant';

/** Splits a one-term numerator (over a one-term or unit-led denominator) into constants × the rest. */
function groupConstants(f: RationalFunction) {
  const [num] = f.numerator.terms;
  if (f.numerator.terms.length !== 1 || !num) return undefined;
  const den = f.denominator.terms;
  const single = den.length === 1 ? den[0] : undefined;
  if (!single && !den.some((t) => t.monomial.isOne())) return undefined;
  const constantPart = (m: Monomial) => Monomial.fromFactors(m.factors.filter(([s]) => isConstant(s)));
  const numConst = constantPart(num.monomial);
  const denConst = single ? constantPart(single.monomial) : Monomial.ONE;
  const coefficient = single ? num.coefficient.div(single.coefficient) : num.coefficient;
  const factors = numConst.factors.length + denConst.factors.length;
  // A single constant needs no new name.
  if (factors === 0 || (factors === 1 && coefficient.equals(Rational.ONE))) return undefined;
  return {
    value: RationalFunction.of(Polynomial.term(coefficient, numConst), Polynomial.term(Rational.ONE, denConst)),
    rest: { coefficient: Rational.ONE, monomial: num.monomial.div(numConst) },
    denominator: single ? Polynomial.term(Rational.ONE, single.monomial.div(denConst)) : f.denominator,
  };
}
