/**
 * The linear steady state: every step at most first order in internal species, so the equations
 * are linear with polynomial coefficients. One fraction-free Bareiss elimination of the augmented
 * matrix gives every internal concentration over one common denominator (for a catalytic cycle
 * this is the King–Altman result, the denominator the sum of its patterns).
 */
import { Monomial, Polynomial, RationalFunction, content, monomialContent, solveShared } from '../exact/index.ts';
import type { WorkBudget } from '../exact/index.ts';
import { gcd, lcm, Rational } from '../exact/rational.ts';
import type { RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import type { CatalystBalance, TraceLine } from './rate-law.ts';
import type { SteadyStateSystem } from './steady-state-system.ts';

/** The exact linear steady state: the rate law, the catalyst balances and the trace lines. */
export interface LinearSteadyState {
  expression: RationalFunction;
  catalystBalances: CatalystBalance[];
  trace: TraceLine[];
}

/** Solves a linear steady-state system; 'singular' or 'budget' when it cannot. */
export function solveLinearSteadyState(
  system: SteadyStateSystem,
  context: RateLawContext,
  fmt: Formatter,
  budget: WorkBudget,
): LinearSteadyState | 'singular' | 'budget' {
  const x = system.unknowns;
  const a = system.equations.map((eq) => x.map((xi) => eq.coefficientIn(xi, 1)));
  const b = system.equations.map((eq) => x.reduce((p, xi) => p.coefficientIn(xi, 0), eq).neg());
  const solved = solveShared(a, b, budget);
  if (typeof solved === 'string') return solved;
  const { numerators, denominator } = commonForm(solved.numerators, solved.denominator);
  const trace: TraceLine[] = [];
  const shared = x.length > 1;
  if (shared) {
    // Every concentration shares this denominator: write it once, as Σ (the sum of the patterns).
    trace.push(fmt.line('the common denominator of the internal species', ['Σ', '\\Sigma'], denominator));
  }
  x.forEach((xi, i) => {
    const left: [string, string] = [xi, fmt.style.latex(xi)];
    if (!shared)
      trace.push(fmt.line(`solved for ${system.species[i]}`, left, RationalFunction.of(numerators[i]!, denominator)));
    else trace.push(overSigma(`solved for ${system.species[i]}`, left, numerators[i]!, fmt));
  });
  const expression = RationalFunction.of(
    rateNumerator(system.rate.polynomial, x, numerators, denominator),
    denominator,
  );
  trace.push(fmt.line(`rate of the overall reaction from ${system.rate.species}`, ['r', 'r'], expression));
  const catalystBalances = context.conservations.map((c) => ({
    catalyst: c.catalyst,
    total: c.total,
    forms: c.species.map((sp) => {
      const fraction = RationalFunction.of(
        numerators[system.species.indexOf(sp)]!,
        denominator.mulTerm(Rational.ONE, Monomial.of(c.total)),
      );
      return { species: sp, fraction, text: fmt.text(fraction), latex: fmt.latex(fraction) };
    }),
  }));
  return { expression, catalystBalances, trace };
}

/**
 * Numerators and denominator with their common constant and monomial factor divided out and a
 * positive leading coefficient below, so the printed Σ is the textbook sum of positive terms.
 */
function commonForm(
  numerators: Polynomial[],
  denominator: Polynomial,
): { numerators: Polynomial[]; denominator: Polynomial } {
  const all = [denominator, ...numerators.filter((n) => !n.isZero())];
  const monomial = all.map(monomialContent).reduce((g, m) => g.gcd(m));
  let scale = all.map(content).reduce((g, c) => Rational.of(gcd(g.num, c.num), lcm(g.den, c.den)));
  if (denominator.leadingTerm()!.coefficient.sign() < 0) scale = scale.neg();
  const divide = (p: Polynomial) => p.mulTerm(scale.inverse(), Monomial.ONE.div(monomial));
  return { numerators: numerators.map(divide), denominator: divide(denominator) };
}

/** N/Σ written with the shared denominator named rather than repeated. */
function overSigma(
  say: string,
  [leftText, leftLatex]: [string, string],
  numerator: Polynomial,
  fmt: Formatter,
): TraceLine {
  const several = numerator.terms.length > 1;
  return {
    say,
    text: `${leftText} = ${several ? `(${fmt.text(numerator)})` : fmt.text(numerator)} / Σ`,
    latex: `${leftLatex} = \\frac{${fmt.latex(numerator)}}{\\Sigma}`,
  };
}

/**
 * The numerator of the rate over the common denominator d: each term of the rate polynomial holds
 * at most one internal concentration to the first power, replaced by its numerator; a term without
 * one is multiplied by d. Summing numerators avoids adding n rational functions.
 */
function rateNumerator(rate: Polynomial, x: string[], numerators: Polynomial[], d: Polynomial): Polynomial {
  const parts = rate.terms.map((term) => {
    const which = x.findIndex((s) => !term.monomial.exponent(s).isZero());
    if (which < 0) return d.mulTerm(term.coefficient, term.monomial);
    return numerators[which]!.mulTerm(term.coefficient, term.monomial.without(x[which]!));
  });
  return Polynomial.sum(parts);
}
