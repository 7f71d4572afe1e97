/**
 * A rate law in the constants a kineticist reads: each denominator factor divided through by its
 * constant term (so it reads 1 + K_A[A] + K_B[B]), the terms of numerator and denominator
 * collected by concentration monomial, and each collected coefficient named — k_obs in the
 * numerator, K_X for the [X] term below — with its definition in elementary constants, unit and
 * value. A site balance squared stays a square: (1 + K_A[A] + K_B[B])². Where a factor has no
 * constant term, its term of lowest degree in the concentrations is divided out instead. Works on
 * exact rational laws (rational exponents allowed); anything else is not normalised.
 */
import { Monomial, Polynomial, RationalFunction, rationalPower } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import {
  apparentConstant,
  bindingConstantUnit,
  rateCoefficientUnit,
  type ApparentConstant,
} from './apparent-constant.ts';
import { byConcentration, type Collected } from './collect-terms.ts';
import { enzymeForm } from './enzyme-constants.ts';
import type { NormalisedLaw, NormalisedTerm } from './normalised-law.ts';
import type { Formatter } from './formatter.ts';
import { bindingName, numeratorNames } from './name-constants.ts';
import type { FactoredLaw } from './rate-law.ts';
import { writeNormalised } from './write-normalised.ts';

/** What the normaliser needs to know besides the law. */
export interface NormaliseOptions {
  /** the law kept in factors (a balance to a power), where the derivation knows them */
  factored?: FactoredLaw;
  /** concentration symbols that are constant (solvents): they belong with the constants */
  constantSymbols: ReadonlySet<string>;
  /** step labels, so that a name such as K_A never reads as the constant of a step labelled A */
  stepLabels: readonly string[];
  /** numeric constants by symbol, for the values */
  values?: ReadonlyMap<string, number>;
}

/** The normalised form of an exact rate law. */
export function normaliseLaw(expression: RationalFunction, options: NormaliseOptions, fmt: Formatter): NormalisedLaw {
  const collect = (p: Polynomial) => byConcentration(p, options.constantSymbols, fmt.style.compare);
  let { numerator, factors } = factoredParts(expression, options.factored);
  // A one-term factor is a monomial: it joins the numerator (as [O2]⁻¹, say).
  for (const f of factors.filter((f) => f.base.terms.length === 1)) {
    const [t] = f.base.terms;
    numerator = numerator.mulTerm(rationalPower(t!.coefficient, Rational.of(-f.power))!, t!.monomial.pow(-f.power));
  }
  factors = factors.filter((f) => f.base.terms.length > 1);
  let scale = Polynomial.ONE;
  let shift = Monomial.ONE;
  const used = new Set<string>();
  const below: ApparentConstant[] = [];
  const normalisedFactors = factors.map(({ base, power }) => {
    const groups = collect(base);
    const reference = leadingGroup(groups, fmt);
    // A negative leading term goes, sign and all, into the scale: the factor still reads 1 + ….
    scale = scale.mul(reference.coefficient.scale(Rational.of(reference.sign)).pow(power));
    shift = shift.mul(reference.concentrations.pow(power));
    const terms: NormalisedTerm[] = [
      { power: Rational.ONE, sign: 1, concentrations: Monomial.ONE, coefficient: reference.coefficient },
    ];
    for (const g of groups.filter((g) => g !== reference)) {
      const m = g.concentrations.div(reference.concentrations);
      const ratio = RationalFunction.of(g.coefficient, reference.coefficient);
      const named = bindingName(m, used, options.stepLabels, ratio, fmt.style.compare);
      used.add(named.name);
      terms.push({
        constant: named.name,
        power: named.power,
        sign: g.sign === reference.sign ? 1 : -1,
        concentrations: m,
        coefficient: g.coefficient,
      });
      const spec = {
        ...named,
        meaning: named.power.equals(Rational.ONE)
          ? `the K of the ${fmt.text(m)} term of the denominator`
          : `the K of the ${fmt.text(m)} term of the denominator, which reads (${named.name}${fmt.text(m.pow(named.power.inverse()))})^(${named.power}) as for dissociative adsorption`,
        unit: bindingConstantUnit(m.totalDegree, named.power),
      };
      below.push(apparentConstant(spec, fmt, options.values));
    }
    return { terms, power, reference: reference.coefficient };
  });
  const groups = collect(numerator);
  const names = numeratorNames(groups);
  const top: ApparentConstant[] = [];
  const numeratorTerms = groups.map((g, i): NormalisedTerm => {
    const concentrations = g.concentrations.div(shift);
    const definition = RationalFunction.of(g.coefficient, scale);
    const spec = { ...names[i]!, definition, unit: rateCoefficientUnit(concentrations.totalDegree) };
    top.push(apparentConstant(spec, fmt, options.values));
    return { constant: names[i]!.name, power: Rational.ONE, sign: g.sign, concentrations, coefficient: g.coefficient };
  });
  const constants = [...top, ...below];
  const written = writeNormalised(numeratorTerms, normalisedFactors, constants, fmt);
  const law: NormalisedLaw = { numerator: numeratorTerms, factors: normalisedFactors, constants, ...written };
  const trade = enzymeForm(law, fmt, options.values);
  if (trade) law.trade = trade;
  return law;
}

/** The value of a normalised law from the values of its apparent constants' definitions (for checks). */
export function evaluateNormalised(law: NormalisedLaw, values: ReadonlyMap<string, number>): number {
  const named = new Map(law.constants.map((c) => [c.name, c.definition.evaluate(values)]));
  const term = (t: NormalisedTerm) =>
    t.sign *
    (t.constant === undefined ? 1 : named.get(t.constant)! ** t.power.toNumber()) *
    t.concentrations.evaluate(values);
  const top = law.numerator.reduce((s, t) => s + term(t), 0);
  return law.factors.reduce((r, f) => r / f.terms.reduce((s, t) => s + term(t), 0) ** f.power, top);
}

/** The numerator and denominator factors, from the derivation's factors where they match the law. */
function factoredParts(expression: RationalFunction, factored?: FactoredLaw) {
  if (factored) {
    const denominator = Polynomial.product(factored.factors.map((f) => f.base.pow(f.power)));
    if (RationalFunction.of(factored.numerator, denominator).equals(expression)) return { ...factored };
  }
  return { numerator: expression.numerator, factors: [{ base: expression.denominator, power: 1 }] };
}

/** The constant term of a factor, else its term of lowest degree in the concentrations (the first as written). */
function leadingGroup(groups: Collected[], fmt: Formatter): Collected {
  const constant = groups.find((g) => g.concentrations.isOne());
  if (constant) return constant;
  const weight = (g: Collected) => g.concentrations.totalDegree.toNumber();
  const low = Math.min(...groups.map(weight));
  const candidates = groups.filter((g) => weight(g) === low);
  const text = (g: Collected) => fmt.text(g.concentrations);
  return candidates.sort((a, b) => (text(a) < text(b) ? -1 : text(a) > text(b) ? 1 : 0))[0]!;
}
