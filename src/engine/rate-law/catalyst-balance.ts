/**
 * The catalyst balance of the pre-equilibrium method: the total of a conserved catalyst is the
 * sum of its forms, each fixed by the equilibria as [C] × (a monomial), so
 * [C]_T = [C](1 + K_1[S] + …) and the rate gains the saturation denominator. Forms made only
 * after the rate-determining step are negligible and left out.
 */
import { Monomial, Polynomial, RationalFunction } from '../exact/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Step } from '../mechanism/mechanism.ts';
import { Rational } from '../exact/rational.ts';
import type { Conservation, RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import type { CatalystBalance, NonlinearSystem, TraceLine } from './rate-law.ts';
import { concentration } from './symbols.ts';

type Outcome =
  | { problem: Diagnostic }
  | { balance?: CatalystBalance; law: RationalFunction; trace: TraceLine[] }
  | { nonlinear: NonlinearSystem; trace: TraceLine[] };

/** Replaces the free catalyst in a pre-equilibrium rate law by its total over the sum of its forms. */
export function catalystBalance(
  conservation: Conservation,
  law: RationalFunction,
  value: ReadonlyMap<string, Monomial>,
  context: RateLawContext,
  rds: Step,
  fmt: Formatter,
): Outcome {
  const free = concentration(conservation.catalyst);
  const exponents = law.numerator.terms.map((t) => t.monomial.exponent(free));
  if (exponents.every((e) => e.isZero())) return { law, trace: [] };
  if (!exponents.every((e) => e.equals(Rational.ONE)) || !law.denominator.degreeIn(free).isZero()) {
    return {
      problem: problem(
        rds,
        `the rate is not first order in the free catalyst ${conservation.catalyst}, so its balance has no closed form here`,
      ),
    };
  }
  const forms: { species: string; term: Polynomial }[] = [];
  const negligible: string[] = [];
  for (const [i, species] of conservation.species.entries()) {
    const weight = conservation.weights[i]!;
    if (species === conservation.catalyst) {
      forms.push({ species, term: Polynomial.constant(weight) });
      continue;
    }
    const v = value.get(species);
    if (v) {
      forms.push({ species, term: Polynomial.term(weight, v.div(Monomial.of(free))) });
    } else if (formedBeforeRds(species, context, rds)) {
      return {
        problem: problem(
          rds,
          `${species} holds part of the catalyst ${conservation.catalyst} but no equilibrium before the rate-determining step fixes its amount`,
        ),
      };
    } else {
      negligible.push(species);
    }
  }
  const denominator = Polynomial.sum(forms.map((f) => f.term));
  if (!denominator.degreeIn(free).isZero() || !denominator.lowDegreeIn(free).isZero())
    return nonlinearBalance(conservation, law, denominator, negligible, fmt);
  const total = conservation.total;
  const numerator = law.numerator.terms.map((t) =>
    Polynomial.term(t.coefficient, t.monomial.without(free).mul(Monomial.of(total))),
  );
  const result = RationalFunction.of(Polynomial.sum(numerator), law.denominator.mul(denominator));
  const formsText = conservation.species.filter((s) => !negligible.includes(s)).map(concentration);
  const trace: TraceLine[] = [
    {
      say: `catalyst balance for ${conservation.catalyst}${negligible.length ? ` (${negligible.join(', ')} formed after the rate-determining step: negligible)` : ''}`,
      text: `${total} = ${formsText.join(' + ')} = ${free}(${fmt.text(denominator)})`,
      latex: `${fmt.style.latex(total)} = ${formsText.map((s) => fmt.style.latex(s)).join(' + ')} = ${fmt.style.latex(free)}\\left(${fmt.latex(denominator)}\\right)`,
    },
    fmt.line('the rate in terms of the total catalyst', ['r', 'r'], result),
  ];
  const fractions = forms.map((f) => {
    const fraction = RationalFunction.of(f.term, denominator);
    return { species: f.species, fraction, text: fmt.text(fraction), latex: fmt.latex(fraction) };
  });
  return { balance: { catalyst: conservation.catalyst, total, forms: fractions }, law: result, trace };
}

/**
 * A form not proportional to the free catalyst (a dimer holds it squared) makes the balance a
 * polynomial equation in [C]: kept for a numeric solution at each observation.
 */
function nonlinearBalance(
  conservation: Conservation,
  law: RationalFunction,
  perFree: Polynomial,
  negligible: string[],
  fmt: Formatter,
): Outcome {
  const free = concentration(conservation.catalyst);
  const den = law.denominator.terms;
  if (den.length !== 1)
    return {
      problem: diagnostic(
        'rate/not-eliminable',
        'error',
        `the balance of ${conservation.catalyst} has no closed form`,
        { path: ['steps'] },
      ),
    };
  const rate = law.numerator.mulTerm(den[0]!.coefficient.inverse(), den[0]!.monomial.pow(-1));
  const balance = perFree.mulTerm(Rational.ONE, Monomial.of(free)).sub(Polynomial.symbol(conservation.total));
  return {
    nonlinear: { unknowns: [free], equations: [balance], rate },
    trace: [
      {
        say: `catalyst balance for ${conservation.catalyst}${negligible.length ? ` (${negligible.join(', ')} negligible)` : ''}: not linear in the free catalyst, so it is solved numerically at each observation`,
        text: `${conservation.total} = ${fmt.text(perFree.mulTerm(Rational.ONE, Monomial.of(free)))}`,
        latex: `${fmt.style.latex(conservation.total)} = ${fmt.latex(perFree.mulTerm(Rational.ONE, Monomial.of(free)))}`,
      },
    ],
  };
}

/** True when some step before the rds along the route forms the species. */
function formedBeforeRds(species: string, context: RateLawContext, rds: Step): boolean {
  const rank = (index: number) => context.order[index] ?? Infinity;
  return context.mechanism.steps.some(
    (s) => rank(s.index) < rank(rds.index) && (s.change.get(species)?.sign() ?? 0) !== 0,
  );
}

function problem(rds: Step, message: string): Diagnostic {
  return diagnostic('rate/not-eliminable', 'error', message, {
    path: ['steps', rds.index],
    note: 'use approximation: steady_state',
  });
}
