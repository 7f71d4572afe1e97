/**
 * The steady-state (Bodenstein) approximation: d[X]/dt = 0 for every internal species, with each
 * conservation relation (a catalyst total) replacing one dependent equation. Where every step is
 * at most first order in internal species the system is linear with polynomial coefficients and
 * is solved exactly by Cramer's rule with fraction-free Bareiss determinants (for catalytic cycles
 * this is the King–Altman result). Otherwise the equations are kept for a numeric solution.
 */
import { Monomial, Polynomial, RationalFunction, solveLinear } from '../exact/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { Rational } from '../exact/rational.ts';
import type { RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import { netRate } from './mass-action.ts';
import type { RateLaw, TraceLine } from './rate-law.ts';
import { overallRatePolynomial } from './overall-rate.ts';
import { concentration } from './symbols.ts';

/** Derives the steady-state rate law exactly, or sets up the nonlinear system for a numeric one. */
export function steadyStateRateLaw(
  context: RateLawContext,
  fmt: Formatter,
): { law?: RateLaw; diagnostics: Diagnostic[] } {
  const { mechanism, internal } = context;
  const x = internal.map(concentration);
  const balance = internal.map((sp) =>
    Polynomial.sum(mechanism.steps.map((step) => netRate(step).scale(step.change.get(sp) ?? Rational.ZERO))),
  );
  const trace: TraceLine[] = internal.map((sp, i) => ({
    say: `steady state for ${sp}`,
    text: `d${concentration(sp)}/dt = ${fmt.text(balance[i]!)} = 0`,
    latex: `\\frac{d${fmt.style.latex(concentration(sp))}}{dt} = ${fmt.latex(balance[i]!)} = 0`,
  }));
  const equations = [...balance];
  for (const c of context.conservations) {
    // The relation makes one balance dependent: replace the equation of its last species.
    const replaced = internal.indexOf(c.species.at(-1)!);
    const sum = Polynomial.sum(
      c.species.map((sp, j) => Polynomial.term(c.weights[j]!, Monomial.of(concentration(sp)))),
    );
    equations[replaced] = sum.sub(Polynomial.symbol(c.total));
    trace.push({
      say: `conservation of ${c.catalyst} (replaces the balance of ${c.species.at(-1)})`,
      text: `${c.total} = ${fmt.text(sum)}`,
      latex: `${fmt.style.latex(c.total)} = ${fmt.latex(sum)}`,
    });
  }
  const rate = overallRatePolynomial(context);
  if (!rate)
    return {
      diagnostics: [
        diagnostic(
          'rate/nonlinear',
          'warning',
          'the route has no product or reactant whose formation gives the overall rate',
          { path: ['steps'] },
        ),
      ],
    };

  if (!isLinear(context)) {
    const law: RateLaw = {
      method: 'steady_state',
      nonlinear: { unknowns: x, equations, rate: rate.polynomial },
      absorbed: [],
      catalystBalances: [],
      trace,
    };
    trace.push(fmt.line(`rate of the overall reaction from ${rate.species}`, ['r', 'r'], rate.polynomial));
    return {
      law,
      diagnostics: [
        diagnostic(
          'rate/nonlinear',
          'info',
          'a step brings two intermediates or catalyst forms together (a recombination, say), so the steady-state equations are not linear: they are solved numerically at each observation that gives constants and concentrations, with no closed-form law',
          {
            path: ['steps'],
          },
        ),
      ],
    };
  }
  const a = equations.map((eq) => x.map((xi) => eq.coefficientIn(xi, 1)));
  const b = equations.map((eq) => x.reduce((p, xi) => p.coefficientIn(xi, 0), eq).neg());
  const solution = internal.length === 0 ? [] : solveLinear(a, b);
  if (!solution) {
    return {
      diagnostics: [
        diagnostic(
          'rate/nonlinear',
          'warning',
          'the steady-state equations do not fix the internal species (a singular system)',
          { path: ['steps'] },
        ),
      ],
    };
  }
  solution.forEach((s, i) => trace.push(fmt.line(`solved for ${internal[i]}`, [x[i]!, fmt.style.latex(x[i]!)], s)));
  const expression = substituteLinear(rate.polynomial, x, solution);
  trace.push(fmt.line(`rate of the overall reaction from ${rate.species}`, ['r', 'r'], expression));
  const catalystBalances = context.conservations.map((c) => ({
    catalyst: c.catalyst,
    total: c.total,
    forms: c.species.map((sp) => {
      const fraction = solution[internal.indexOf(sp)]!.div(RationalFunction.fromPolynomial(Polynomial.symbol(c.total)));
      return { species: sp, fraction, text: fmt.text(fraction), latex: fmt.latex(fraction) };
    }),
  }));
  return { law: { method: 'steady_state', expression, absorbed: [], catalystBalances, trace }, diagnostics: [] };
}

/** Every step at most first order in internal species, on each side. */
function isLinear(context: RateLawContext): boolean {
  const internal = new Set(context.internal);
  const order = (terms: { species: string; coefficient: Rational }[]) =>
    terms.filter((t) => internal.has(t.species)).reduce((n, t) => n + t.coefficient.toNumber(), 0);
  return context.mechanism.steps.every((s) => order(s.reactants) <= 1 && (!s.reversible || order(s.products) <= 1));
}

/** Substitutes rational functions for symbols that occur at most to the first power in each term. */
function substituteLinear(p: Polynomial, symbols: string[], values: RationalFunction[]): RationalFunction {
  let out = RationalFunction.ZERO;
  for (const term of p.terms) {
    const which = symbols.findIndex((s) => !term.monomial.exponent(s).isZero());
    const rest = RationalFunction.of(
      Polynomial.term(term.coefficient, which < 0 ? term.monomial : term.monomial.without(symbols[which]!)),
    );
    out = out.add(which < 0 ? rest : rest.mul(values[which]!));
  }
  return out;
}
